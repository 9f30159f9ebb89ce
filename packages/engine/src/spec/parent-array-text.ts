import { ParseError } from '../errors';

/**
 * Reads a parent array written as whole numbers separated by spaces, commas or line breaks, one per
 * vertex in vertex order, -1 for a root (`#` starts a comment to the end of the line). One pass.
 */
export function parseParentArray(text: string): number[] {
  const out: number[] = [];
  let line = 1;
  let lineStart = 0;
  let i = 0;
  const n = text.length;
  while (i < n) {
    const ch = text.charCodeAt(i);
    if (ch === 10) {
      line++;
      lineStart = ++i;
    } else if (ch === 32 || ch === 9 || ch === 13 || ch === 44) {
      i++;
    } else if (ch === 35) {
      while (i < n && text.charCodeAt(i) !== 10) i++;
    } else {
      const start = i;
      while (i < n && !/[\s,#]/.test(text[i]!)) i++;
      const token = text.slice(start, i);
      if (!/^(-1|\d+)$/.test(token)) {
        throw new ParseError('parent-array', { line, column: start - lineStart + 1 }, 'a vertex number or -1 for a root', `'${token.slice(0, 20)}'`);
      }
      out.push(Number(token));
    }
  }
  if (out.length === 0) throw new ParseError('parent-array', { line, column: 1 }, 'one parent per vertex', 'no numbers');
  return out;
}
