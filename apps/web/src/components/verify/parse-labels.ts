/** The outcome of reading labels: the numbers in vertex order, or the first thing wrong with the text. */
export type LabelsRead = { ok: true; labels: number[] } | { ok: false; message: string };

const WHOLE = /^\d+$/;

/**
 * Labels as typed or pasted: numbers separated by spaces, commas, semicolons or line breaks, in vertex
 * order; rows of numbers for a grid read the same way (row by row is the engine's numbering). For a mask,
 * "." may stand for a hole and is skipped, as in the engine's label pictures.
 */
export function parseLabelText(text: string, { holes = false }: { holes?: boolean } = {}): LabelsRead {
  const tokens = text.split(/[\s,;]+/).filter((t) => t.length > 0);
  if (tokens.length === 0) return { ok: false, message: 'Give the labels: one whole number per vertex, such as 1 2 1 3' };
  const labels: number[] = [];
  for (let i = 0; i < tokens.length; i++) {
    const t = tokens[i]!;
    if (holes && t === '.') continue;
    if (!WHOLE.test(t)) return { ok: false, message: `item ${i + 1} ("${t.slice(0, 20)}") is not a whole number` };
    const n = Number(t);
    if (n < 1) return { ok: false, message: `item ${i + 1} is ${n}; labels start at 1` };
    labels.push(n);
  }
  return { ok: true, labels };
}

/**
 * A label file: `vertex,label` lines (a header line is skipped), vertices numbered from 0 in the engine's
 * order, each exactly once. A file of bare numbers (with or without a `label` header) reads as a list.
 */
export function parseLabelCsv(text: string): LabelsRead {
  const lines = text.split(/\r?\n/).map((l) => l.trim()).filter((l) => l.length > 0 && !l.startsWith('#'));
  if (lines.length === 0) return { ok: false, message: 'the file is empty' };
  const first = lines[0]!.split(/\s*[,;\t]\s*/);
  const header = first.some((f) => !WHOLE.test(f) && f !== '.');
  const body = header ? lines.slice(1) : lines;
  const pairs = (header ? first.length : body[0]?.split(/\s*[,;\t]\s*/).length) === 2;
  if (!pairs) return parseLabelText(body.join('\n'), { holes: true });
  const byVertex = new Map<number, number>();
  for (let i = 0; i < body.length; i++) {
    const line = i + 1 + (header ? 1 : 0);
    const fields = body[i]!.split(/\s*[,;\t]\s*/);
    if (fields.length !== 2 || !WHOLE.test(fields[0]!) || !WHOLE.test(fields[1]!)) return { ok: false, message: `line ${line}: expected "vertex,label" (two whole numbers), got "${body[i]!.slice(0, 40)}"` };
    const v = Number(fields[0]);
    const l = Number(fields[1]);
    if (l < 1) return { ok: false, message: `line ${line}: the label of vertex ${v} is ${l}; labels start at 1` };
    if (byVertex.has(v)) return { ok: false, message: `line ${line}: vertex ${v} is labelled twice` };
    byVertex.set(v, l);
  }
  const labels: number[] = new Array(byVertex.size);
  for (let v = 0; v < byVertex.size; v++) {
    const l = byVertex.get(v);
    if (l === undefined) return { ok: false, message: `vertex ${v} has no label (vertices are numbered from 0, with none missing)` };
    labels[v] = l;
  }
  return { ok: true, labels };
}
