import type { TextPosition } from '../errors';

const LINE_FEED = 10;

/** True for the white space a line may carry around its fields: space, tab, carriage return. */
export function isBlankChar(c: number): boolean {
  return c === 32 || c === 9 || c === 13;
}

/**
 * Line and column (1-based) of a character index. Columns count UTF-16 code units. O(offset): meant for
 * error paths, where the readers no longer track lines themselves.
 */
export function positionAt(text: string, offset: number): TextPosition {
  let line = 1;
  let lineStart = 0;
  for (let nl = text.indexOf('\n'); nl >= 0 && nl < offset; nl = text.indexOf('\n', nl + 1)) {
    line++;
    lineStart = nl + 1;
  }
  return { line, column: offset - lineStart + 1 };
}

/** Positions of many offsets in one sweep of the text (any order in, same order out). */
export function positionsAt(text: string, offsets: readonly number[]): TextPosition[] {
  const order = offsets.map((_, i) => i).sort((a, b) => offsets[a]! - offsets[b]!);
  const out: TextPosition[] = new Array(offsets.length);
  let line = 1;
  let lineStart = 0;
  let scanned = 0;
  for (const i of order) {
    const offset = offsets[i]!;
    for (; scanned < offset && scanned < text.length; scanned++) {
      if (text.charCodeAt(scanned) === LINE_FEED) {
        line++;
        lineStart = scanned + 1;
      }
    }
    out[i] = { line, column: offset - lineStart + 1 };
  }
  return out;
}

/**
 * Where "the file ends" is reported: just past the last character that is not white space, so an error
 * about a truncated file names the last line a person sees in an editor. Line 1, column 1 for empty text.
 */
export function endOfTextPosition(text: string): TextPosition {
  let i = text.length - 1;
  while (i >= 0 && (isBlankChar(text.charCodeAt(i)) || text.charCodeAt(i) === LINE_FEED)) i--;
  return i < 0 ? { line: 1, column: 1 } : positionAt(text, i + 1);
}

/** A piece of input quoted for an error message, shortened so one bad line cannot flood it. */
export function quoted(piece: string): string {
  return JSON.stringify(piece.length > 24 ? `${piece.slice(0, 24)}…` : piece);
}

/** "1 edge", "3 edges": counts in error messages read as sentences. */
export function countOf(count: number, singular: string, plural = `${singular}s`): string {
  return `${count} ${count === 1 ? singular : plural}`;
}
