import type { GraphFormat } from './formats';
import type { TextInput } from './text-input';

/** File extensions that name one format. `.txt` is not among them: it says "text", so the content decides. */
const FORMAT_OF_EXTENSION: Readonly<Record<string, GraphFormat>> = {
  mtx: 'matrix-market',
  gr: 'dimacs',
  dimacs: 'dimacs',
  col: 'dimacs',
  edges: 'edge-list',
  el: 'edge-list',
  json: 'json',
  mask: 'mask',
};

/** How much of the input detection looks at: a format shows itself in its first lines. */
const SNIFF_CHARS = 64 * 1024;

/**
 * Which format a file is in. A known extension decides (.mtx; .gr, .dimacs, .col; .edges, .el; .json;
 * .mask). Otherwise (no name, .txt, anything else) the content does: a `%%MatrixMarket` banner; a leading
 * `{` or `[` (JSON); a first line, after blank lines, that is a DIMACS comment `c ...` or problem line
 * `p ...`; nothing but `#`, `.` and white space (a mask); and else an edge list. Never throws: the chosen
 * reader reports what is wrong with the content.
 */
export function detectFormat(input: TextInput, fileName?: string): GraphFormat {
  const extension = fileName ? extensionOf(fileName) : '';
  const byName = Object.hasOwn(FORMAT_OF_EXTENSION, extension) ? FORMAT_OF_EXTENSION[extension] : undefined;
  return byName ?? formatOfContent(head(input));
}

function extensionOf(fileName: string): string {
  const base = fileName.slice(Math.max(fileName.lastIndexOf('/'), fileName.lastIndexOf('\\')) + 1);
  const dot = base.lastIndexOf('.');
  return dot <= 0 ? '' : base.slice(dot + 1).toLowerCase();
}

/** The first characters of the input, decoded leniently (the readers decide whether bytes are text). */
function head(input: TextInput): string {
  const text = typeof input === 'string' ? input.slice(0, SNIFF_CHARS) : new TextDecoder().decode(input.subarray(0, SNIFF_CHARS));
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

function formatOfContent(text: string): GraphFormat {
  const start = text.search(/\S/);
  if (start < 0) return 'edge-list';
  if (text.startsWith('%%MatrixMarket', start)) return 'matrix-market';
  const first = text[start];
  if (first === '{' || first === '[') return 'json';
  // DIMACS lines open with a one-letter designator; no edge list, JSON document or mask starts with c or p.
  if (/^[cp](?:\s|$)/.test(text.slice(start, start + 2))) return 'dimacs';
  // Only cells, holes and white space; an edge list's "#" comments always say something more.
  if (/^[#.\s]*$/.test(text)) return 'mask';
  return 'edge-list';
}
