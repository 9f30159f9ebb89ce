import { ApiError, RunExportFormat } from '@cairn/schema';
import { useState } from 'react';
import { exportHref, type ExportBase } from '../../api/runs';
import { quietButtonClass } from './bits';

const FORMAT_WORDS: Record<RunExportFormat, string> = {
  json: 'JSON (the run and its result)',
  csv: 'CSV (vertex, label)',
  svg: 'SVG drawing',
  tikz: 'TikZ for LaTeX',
};

/** The SVG export drawn onto a canvas at twice its size, then saved as PNG: the server draws, the browser rasterises. */
async function svgToPng(svgUrl: string): Promise<Blob> {
  const res = await fetch(svgUrl, { credentials: 'same-origin' });
  if (!res.ok) {
    const body: unknown = await res.json().catch(() => undefined);
    const parsed = ApiError.safeParse(body);
    throw new Error(parsed.success ? parsed.data.error.message : `${res.status} ${res.statusText}`);
  }
  const svg = await res.text();
  const url = URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' }));
  try {
    const img = new Image();
    await new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error('the browser could not read the SVG drawing'));
      img.src = url;
    });
    const scale = 2;
    const width = img.naturalWidth || 1200;
    const height = img.naturalHeight || 1200;
    const canvas = document.createElement('canvas');
    canvas.width = width * scale;
    canvas.height = height * scale;
    const ctx = canvas.getContext('2d');
    if (!ctx) throw new Error('this browser has no 2D canvas');
    ctx.fillStyle = '#f6f3ec';
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob>((resolve, reject) => canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('the canvas gave no PNG'))), 'image/png'));
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** Downloads of a finished run: the server's files, and a PNG made here from the SVG. */
export function ExportLinks({ base, fileStem }: { base: ExportBase; fileStem: string }) {
  const [pngState, setPngState] = useState<{ busy: boolean; error: string | null }>({ busy: false, error: null });
  const makePng = async () => {
    setPngState({ busy: true, error: null });
    try {
      const blob = await svgToPng(exportHref(base, 'svg'));
      const url = URL.createObjectURL(blob);
      const a = document.createElement('a');
      a.href = url;
      a.download = `${fileStem}.png`;
      a.click();
      URL.revokeObjectURL(url);
      setPngState({ busy: false, error: null });
    } catch (err) {
      setPngState({ busy: false, error: err instanceof Error ? err.message : String(err) });
    }
  };
  return (
    <div className="space-y-2">
      <ul className="flex flex-wrap gap-2" data-testid="exports">
        {RunExportFormat.options.map((f) => (
          <li key={f}>
            <a className={quietButtonClass} href={exportHref(base, f)} download>
              {FORMAT_WORDS[f]}
            </a>
          </li>
        ))}
        <li>
          <button type="button" className={quietButtonClass} onClick={() => void makePng()} disabled={pngState.busy}>
            {pngState.busy ? 'Drawing PNG…' : 'PNG picture'}
          </button>
        </li>
      </ul>
      <p aria-live="polite" className="text-sm text-alarm-600">
        {pngState.error && `No PNG: ${pngState.error}`}
      </p>
    </div>
  );
}
