import { zodResolver } from '@hookform/resolvers/zod';
import { VerifyRequest, type StoredGraphView, type VerifyResponse } from '@cairn/schema';
import { useMemo, useState, type ChangeEvent } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { fieldProblems } from '../../api/client';
import { useUploadedGraphs, useVerify } from '../../api/verify';
import { Field, FieldError, FormSubmit } from '../form/Field';
import { ErrorNote, formFieldOf, inputClass, quietButtonClass } from '../sweep/states';
import { readGraphInput, type GraphInput } from './graph-input';
import { parseLabelCsv, parseLabelText } from './parse-labels';
import { VerifyResult } from './VerifyResult';

interface FormValues {
  source: 'text' | 'upload';
  graphText: string;
  graphId: string;
  labelsText: string;
  /** Labels read from a CSV file; while set they are sent instead of the text box. */
  fileLabels: number[] | null;
}

interface Checked {
  body: VerifyRequest;
  input: GraphInput | null;
  labels: number[];
}

/**
 * The form's rules: the graph box read as a spec or mask (shared GraphSpec rules), the labels parsed, one
 * per vertex when the count is known (uploads give theirs), then the whole body checked as a VerifyRequest.
 */
function verifySchema(uploads: readonly StoredGraphView[]) {
  return z
    .object({
      source: z.enum(['text', 'upload']),
      graphText: z.string(),
      graphId: z.string(),
      labelsText: z.string(),
      fileLabels: z.array(z.number()).nullable(),
    })
    .transform((v, ctx): Checked => {
      let input: GraphInput | null = null;
      let vertexCount: number | null = null;
      let graph: Pick<VerifyRequest, 'spec' | 'graphId'> = {};
      if (v.source === 'text') {
        const read = readGraphInput(v.graphText);
        if (!read.ok) ctx.addIssue({ code: 'custom', path: ['graphText'], message: read.message });
        else {
          input = read.input;
          vertexCount = read.input.vertexCount;
          graph = { spec: read.input.spec };
        }
      } else if (v.graphId === '') {
        ctx.addIssue({ code: 'custom', path: ['graphId'], message: 'Pick one of your uploaded graphs' });
      } else {
        vertexCount = uploads.find((g) => g.id === v.graphId)?.vertexCount ?? null;
        graph = { graphId: v.graphId };
      }
      const read = v.fileLabels ? { ok: true as const, labels: v.fileLabels } : parseLabelText(v.labelsText, { holes: input?.mask ?? false });
      if (!read.ok) ctx.addIssue({ code: 'custom', path: ['labelsText'], message: read.message });
      else if (vertexCount !== null && read.labels.length !== vertexCount) {
        ctx.addIssue({ code: 'custom', path: ['labelsText'], message: `${read.labels.length} labels for ${vertexCount} vertices: give exactly one label per vertex` });
      }
      if (!read.ok || ctx.issues.length > 0) return z.NEVER;
      const body = VerifyRequest.safeParse({ ...graph, labels: read.labels });
      if (!body.success) {
        for (const issue of body.error.issues) ctx.addIssue({ code: 'custom', path: [issue.path[0] === 'labels' ? 'labelsText' : 'graphText'], message: issue.message });
        return z.NEVER;
      }
      return { body: body.data, input, labels: read.labels };
    });
}

type Schema = ReturnType<typeof verifySchema>;

/** A chosen file's text; FileReader rather than Blob.text() so older browsers (and jsdom) manage too. */
function readText(file: File): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result));
    reader.onerror = () => reject(reader.error ?? new Error('unreadable'));
    reader.readAsText(file);
  });
}

/** The graph's boxes stand under the bold "Graph" legend, so their own labels are plain. */
const GRAPH_LABEL_CLASS = 'mb-1 block text-sm';

/** Where a server field problem belongs on this form. */
const FIELD_OF: Record<string, keyof FormValues> = { spec: 'graphText', graphId: 'graphId', labels: 'labelsText' };

/** /verify's form: a graph, a labelling, and the server's verdict below. */
export function VerifyForm() {
  const uploads = useUploadedGraphs(true);
  const uploadList = useMemo(() => uploads.data?.items ?? [], [uploads.data]);
  const schema = useMemo(() => verifySchema(uploadList), [uploadList]);
  const verify = useVerify();
  const [result, setResult] = useState<{ verdict: VerifyResponse; input: GraphInput | null; labels: number[] } | null>(null);
  const [fileName, setFileName] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    control,
    setError,
    setValue,
    clearErrors,
    formState: { errors, isSubmitting },
  } = useForm<z.input<Schema>, unknown, z.output<Schema>>({
    resolver: zodResolver(schema),
    defaultValues: { source: 'text', graphText: '', graphId: '', labelsText: '', fileLabels: null },
  });
  const [source, graphText, fileLabels] = useWatch({ control, name: ['source', 'graphText', 'fileLabels'] });
  const hint = useMemo(() => (graphText.trim() === '' ? null : readGraphInput(graphText)), [graphText]);

  const onFile = async (e: ChangeEvent<HTMLInputElement>) => {
    const file = e.target.files?.[0];
    e.target.value = '';
    if (!file) return;
    let text: string;
    try {
      text = await readText(file);
    } catch (err) {
      setError('labelsText', { message: `${file.name}: could not read the file (${err instanceof Error ? err.message : String(err)})` });
      return;
    }
    const read = parseLabelCsv(text);
    if (!read.ok) {
      setValue('fileLabels', null);
      setFileName(null);
      setError('labelsText', { message: `${file.name}: ${read.message}` });
      return;
    }
    setValue('fileLabels', read.labels);
    setFileName(file.name);
    clearErrors('labelsText');
  };

  const onSubmit = async ({ body, input, labels }: Checked) => {
    setResult(null);
    try {
      const verdict = await verify.mutateAsync(body);
      setResult({ verdict, input, labels });
    } catch (err) {
      const problems = fieldProblems(err);
      let placed = 0;
      for (const p of problems) {
        const field = FIELD_OF[formFieldOf(p.field).split('.')[0]!];
        if (field) {
          setError(field, { message: p.message });
          placed++;
        }
      }
      if (placed === 0) setError('root', { message: err instanceof Error ? err.message : String(err) });
    }
  };

  const describedBy = (field: string, extra?: string) => [errors[field as keyof FormValues] ? `verify-${field}-error` : null, extra].filter(Boolean).join(' ') || undefined;

  return (
    <div className="space-y-8">
      <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-5 rounded-lg border border-stone-200 bg-stone-100/50 p-4 sm:p-5" aria-label="Verify a labelling">
        <fieldset className="space-y-3">
          <legend className="text-sm font-medium">Graph</legend>
          <div className="flex flex-wrap gap-4 text-sm">
            <label className="inline-flex items-center gap-2">
              <input type="radio" value="text" {...register('source')} /> a spec or a mask
            </label>
            <label className="inline-flex items-center gap-2">
              <input type="radio" value="upload" {...register('source')} /> one of my uploads
            </label>
          </div>
          {source === 'text' ? (
            <Field id="verify-graphText" label="Spec or mask" error={errors.graphText?.message} labelClassName={GRAPH_LABEL_CLASS}>
              <textarea
                id="verify-graphText"
                rows={4}
                spellCheck={false}
                className={`${inputClass} font-mono`}
                placeholder={'grid:4x7\n— or a mask, # a cell and . a hole:\n###.\n####'}
                {...register('graphText')}
                aria-invalid={errors.graphText ? true : undefined}
                aria-describedby={describedBy('graphText', 'verify-graph-hint')}
              />
              <p id="verify-graph-hint" className="mt-1 text-xs text-lichen-700" aria-live="polite">
                {hint === null ? 'grid:R×C, cylinder:R×C, torus:R×C, staircase:T, path:N, … or a pasted mask.' : hint.ok ? `Read as ${hint.input.describe}.` : ''}
              </p>
            </Field>
          ) : (
            <Field id="verify-graphId" label="Uploaded graph" error={errors.graphId?.message} labelClassName={GRAPH_LABEL_CLASS}>
              {uploads.isError ? (
                <ErrorNote error={uploads.error} what="list your uploads" />
              ) : (
                <select
                  id="verify-graphId"
                  className={inputClass}
                  disabled={uploads.isLoading}
                  {...register('graphId')}
                  aria-invalid={errors.graphId ? true : undefined}
                  aria-describedby={describedBy('graphId')}
                >
                  <option value="">{uploads.isLoading ? 'Loading your uploads…' : uploadList.length === 0 ? 'No uploads yet — upload a graph on a new run' : 'Pick a graph'}</option>
                  {uploadList.map((g) => (
                    <option key={g.id} value={g.id}>
                      {g.name} — {g.vertexCount} vertices, {g.edgeCount} edges ({g.format})
                    </option>
                  ))}
                </select>
              )}
            </Field>
          )}
        </fieldset>

        <div className="space-y-2">
          <label htmlFor="verify-labelsText" className="block text-sm font-medium">
            Labels
          </label>
          <p id="verify-labels-help" className="text-xs text-lichen-700">
            One whole number per vertex in Cairn&rsquo;s numbering, separated by spaces, commas or line breaks; for a grid, its rows one per line.
          </p>
          <textarea
            id="verify-labelsText"
            rows={6}
            spellCheck={false}
            className={`${inputClass} font-mono`}
            placeholder={'1 2 1 3 1 2 1\n4 4 4 5 4 4 4\n…'}
            disabled={fileLabels !== null}
            {...register('labelsText')}
            aria-invalid={errors.labelsText ? true : undefined}
            aria-describedby={describedBy('labelsText', 'verify-labels-help')}
          />
          <FieldError id="verify-labelsText-error" message={errors.labelsText?.message} />
          <div className="flex flex-wrap items-center gap-3 text-sm">
            <label htmlFor="verify-file" className={`${quietButtonClass} cursor-pointer`}>
              Read a CSV file (vertex,label)
            </label>
            <input id="verify-file" type="file" accept=".csv,.txt,text/csv,text/plain" className="sr-only" onChange={onFile} />
            {fileLabels !== null && (
              <>
                <span aria-live="polite" data-testid="file-labels">
                  {fileLabels.length} labels read from {fileName}
                </span>
                <button
                  type="button"
                  className="text-lichen-700 underline underline-offset-2"
                  onClick={() => {
                    setValue('fileLabels', null);
                    setFileName(null);
                  }}
                >
                  Use the typed labels instead
                </button>
              </>
            )}
          </div>
        </div>

        <FormSubmit problem={errors.root?.message} pending={isSubmitting} pendingText="Checking…">
          Check the labelling
        </FormSubmit>
      </form>
      {/* Always present, so screen readers hear the verdict without reading out the whole picture. */}
      <p className="sr-only" aria-live="polite">
        {isSubmitting ? 'Checking…' : result ? (result.verdict.valid ? 'The labelling is a ranking.' : `Not a ranking: ${result.verdict.violation.message}`) : ''}
      </p>
      {result && <VerifyResult verdict={result.verdict} input={result.input} labels={result.labels} />}
    </div>
  );
}
