import { EngineError, ParseError } from '../errors';
import type { MaskShape } from '../graph/family';
import { MAX_VERTICES } from '../graph/limits';
import { LineCursor } from './line-cursor';
import { decodeTextInput, type TextInput } from './text-input';
import { isBlankChar, quoted } from './text-position';

const FORMAT = 'mask';
const CELL = 35; // '#'
const HOLE = 46; // '.'

/**
 * Reads a mask drawn in text: one line per row, `#` for a cell and `.` for a hole, every row the same
 * length. White space may end a row; blank lines may come before the first row and after the last, not
 * between rows. Anything else is an error at its line and column, as is a mask with no cell or more than
 * MAX_VERTICES positions (rows x columns).
 */
export function parseMaskText(input: TextInput): MaskShape {
  const text = decodeTextInput(input, FORMAT);
  const cursor = new LineCursor(text, FORMAT);
  let cols = -1;
  let rows = 0;
  let firstRowLine = 0;
  let cells = 0;
  let blankLine = 0; // a blank line after some rows: an error only if another row follows
  let present = new Uint8Array(1024);
  while (cursor.nextLine()) {
    let p = cursor.start;
    while (p < cursor.end && (text.charCodeAt(p) === CELL || text.charCodeAt(p) === HOLE)) p++;
    const width = p - cursor.start;
    for (let q = p; q < cursor.end; q++) {
      if (!isBlankChar(text.charCodeAt(q))) cursor.fail(p, '"#" (a cell) or "." (a hole)', describeChar(text, p));
    }
    if (width === 0) {
      if (rows > 0 && blankLine === 0) blankLine = cursor.line;
      continue;
    }
    if (blankLine > 0) {
      throw new ParseError(FORMAT, { line: blankLine, column: 1 }, `a row of ${cols} cells and holes`, 'a blank line between rows');
    }
    if (cols < 0) {
      cols = width;
      firstRowLine = cursor.line;
    } else if (width < cols) {
      cursor.fail(p, `${cols} cells and holes, as on line ${firstRowLine}`, `${width} (the row ends early)`);
    } else if (width > cols) {
      cursor.fail(cursor.start + cols, `${cols} cells and holes, as on line ${firstRowLine}`, `${width} (the row runs on)`);
    }
    if ((rows + 1) * cols > MAX_VERTICES) cursor.fail(cursor.start, `at most ${MAX_VERTICES} positions (rows x columns)`, `${rows + 1} rows of ${cols}`, 'the mask is too large');
    if ((rows + 1) * cols > present.length) {
      const grown = new Uint8Array(Math.max(2 * present.length, (rows + 1) * cols));
      grown.set(present);
      present = grown;
    }
    const offset = rows * cols;
    for (let c = 0; c < cols; c++) {
      if (text.charCodeAt(cursor.start + c) === CELL) {
        present[offset + c] = 1;
        cells++;
      }
    }
    rows++;
  }
  if (rows === 0) throw new ParseError(FORMAT, { line: 1, column: 1 }, 'rows of "#" (cells) and "." (holes)', text.length === 0 ? 'empty text' : 'only blank lines');
  if (cells === 0) throw new ParseError(FORMAT, { line: firstRowLine, column: 1 }, 'at least one cell "#"', 'only holes "."');
  return { rows, cols, present: present.slice(0, rows * cols) };
}

/** The text form of a mask: rows of `#` and `.`, each ending in a newline. parseMaskText reads it back. */
export function formatMaskText(shape: MaskShape): string {
  const { rows, cols, present } = shape;
  if (!Number.isInteger(rows) || !Number.isInteger(cols) || rows < 1 || cols < 1 || present.length !== rows * cols) {
    throw new EngineError('invalid_mask', `a mask needs whole rows, cols >= 1 and rows * cols presence flags; got ${rows} x ${cols} with ${present.length}`);
  }
  const bytes = new Uint8Array(rows * (cols + 1));
  let w = 0;
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) bytes[w++] = present[r * cols + c] ? CELL : HOLE;
    bytes[w++] = 10;
  }
  // ASCII bytes decode to the same characters; this avoids building millions of one-character strings.
  return new TextDecoder().decode(bytes);
}

function describeChar(text: string, at: number): string {
  const c = text.charCodeAt(at);
  if (c === 32) return 'a space';
  if (c === 9) return 'a tab';
  return quoted(String.fromCodePoint(text.codePointAt(at)!));
}
