import { UploadFormat, type UploadResult } from '@cairn/schema';
import { useMutation } from '@tanstack/react-query';
import { useId, useRef, useState, type DragEvent } from 'react';
import { errorCode, parseErrorPlace, uploadGraph } from '../../api/uploads';
import { FieldError } from '../form/Field';
import { inputClass, quietButtonClass } from '../run/bits';

const FORMAT_WORDS: Record<UploadFormat, string> = {
  'edge-list': 'Edge list (u v per line)',
  dimacs: 'DIMACS (p edge / p tw)',
  'matrix-market': 'Matrix Market (pattern)',
  json: 'Cairn JSON',
  mask: 'Mask (# and .)',
};

export interface GraphUploadProps {
  /** Called with the stored graph once the server has read the file. */
  onUploaded: (result: UploadResult) => void;
  /** A problem with the upload from the surrounding form (e.g. the server's `body.graphId`). */
  problem?: string | undefined;
}

/**
 * Sends a graph file to POST /api/v1/graphs: dropped on the zone or chosen with the file picker. The
 * server reads it with the engine's readers; a refusal names the line and column, and what the reader
 * dropped (self-loops, repeated edges) is listed.
 */
export function GraphUpload({ onUploaded, problem }: GraphUploadProps) {
  const ids = { file: useId(), format: useId(), error: useId(), problem: useId(), hint: useId() };
  const [format, setFormat] = useState<UploadFormat | ''>('');
  const [dragging, setDragging] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  const upload = useMutation({
    mutationFn: (file: File) => uploadGraph(file, { format: format || undefined }),
    onSuccess: (result) => onUploaded(result),
  });

  const send = (files: FileList | null) => {
    const file = files?.[0];
    if (file) upload.mutate(file);
  };
  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setDragging(false);
    send(e.dataTransfer.files);
  };

  const place = upload.isError ? parseErrorPlace(upload.error) : null;
  const code = upload.isError ? errorCode(upload.error) : null;
  const result = upload.data;

  return (
    <div className="space-y-3" data-testid="graph-upload">
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        className={`flex flex-col items-center gap-2 rounded-lg border-2 border-dashed px-4 py-6 text-center text-sm ${dragging ? 'border-ochre-500 bg-ochre-500/10' : 'border-stone-200 bg-stone-50'}`}
        data-testid="drop-zone"
      >
        <p id={ids.hint}>Drop a graph file here, or choose one. Edge lists, DIMACS, Matrix Market, Cairn JSON and masks are read.</p>
        <label htmlFor={ids.file} className={`${quietButtonClass} cursor-pointer`}>
          Choose a graph file
        </label>
        <input
          ref={input}
          id={ids.file}
          type="file"
          className="sr-only"
          accept=".txt,.el,.edges,.gr,.dimacs,.col,.mtx,.json,.mask,text/plain,application/json"
          aria-describedby={[ids.hint, upload.isError ? ids.error : '', problem ? ids.problem : ''].join(' ').trim()}
          onChange={(e) => {
            send(e.target.files);
            e.target.value = ''; // the same file again (after fixing it) must fire a change too
          }}
        />
      </div>
      <div className="w-64">
        <label htmlFor={ids.format} className="block text-xs text-lichen-700">
          File format
        </label>
        <select id={ids.format} className={inputClass} value={format} onChange={(e) => setFormat(e.target.value as UploadFormat | '')}>
          <option value="">Detect from name and content</option>
          {UploadFormat.options.map((f) => (
            <option key={f} value={f}>
              {FORMAT_WORDS[f]}
            </option>
          ))}
        </select>
      </div>

      <div aria-live="polite">
        {upload.isPending && <p className="text-sm text-lichen-500">Reading the file on the server…</p>}
        {upload.isError && (
          <div id={ids.error} role="alert" className="space-y-1 rounded-md border border-alarm-600/40 bg-alarm-600/10 px-3 py-2 text-sm text-alarm-600" data-testid="upload-error">
            <p className="font-medium">
              {place ? `The file was refused at line ${place.line}, column ${place.column}.` : code === 'file_too_large' ? 'The file is too large.' : 'The file was refused.'}
            </p>
            <p className="font-mono text-xs">{upload.error.message}</p>
          </div>
        )}
        {result && (
          <div className="space-y-2 rounded-md bg-stone-100 px-3 py-2 text-sm" data-testid="upload-result">
            <p>
              <span className="font-medium">{result.graph.name}</span> · {FORMAT_WORDS[result.graph.format]} · {result.graph.vertexCount.toLocaleString('en')} vertices,{' '}
              {result.graph.edgeCount.toLocaleString('en')} edges
              {!result.created && <span className="text-lichen-700"> · you uploaded these bytes before; that graph is used</span>}
            </p>
            {result.warningCount > 0 && (
              <div>
                <p className="text-ochre-700">
                  The reader dropped {result.warningCount} line{result.warningCount === 1 ? '' : 's'}:
                </p>
                <ul className="list-disc pl-5 font-mono text-xs" data-testid="upload-warnings">
                  {result.warnings.map((w, i) => (
                    <li key={i}>
                      line {w.line}, column {w.column}: {w.message}
                    </li>
                  ))}
                  {result.warningCount > result.warnings.length && <li>… and {result.warningCount - result.warnings.length} more</li>}
                </ul>
              </div>
            )}
          </div>
        )}
      </div>
      <FieldError id={ids.problem} message={problem} />
    </div>
  );
}
