/** A mask as the editor holds it: rows x cols positions, row by row, true for a cell and false for a hole. */
export interface MaskModel {
  rows: number;
  cols: number;
  cells: boolean[];
}

/** The largest mask edited cell by cell; larger shapes go in as a file upload. */
export const EDITOR_MAX_SIDE = 64;

export type MaskRead = { ok: true; mask: MaskModel } | { ok: false; message: string; line: number; column: number };

/**
 * Reads mask text the way the engine does: one line per row, `#` a cell and `.` a hole, every row the
 * same length; white space may end a row, and blank lines may come before the first row and after the
 * last, not between rows. A fault names its line and column (1-based).
 */
export function parseMaskText(text: string): MaskRead {
  const lines = text.split(/\r?\n/);
  let first = 0;
  while (first < lines.length && lines[first]!.trim() === '') first++;
  let last = lines.length - 1;
  while (last >= first && lines[last]!.trim() === '') last--;
  if (first > last) return { ok: false, message: 'the mask is empty: write rows of # (a cell) and . (a hole)', line: 1, column: 1 };
  const rows: string[] = [];
  for (let i = first; i <= last; i++) {
    const row = lines[i]!.replace(/\s+$/, '');
    if (row === '') return { ok: false, message: 'a blank line between rows', line: i + 1, column: 1 };
    const bad = /[^#.]/.exec(row);
    if (bad) return { ok: false, message: `found "${bad[0]}", expected # (a cell) or . (a hole)`, line: i + 1, column: bad.index + 1 };
    if (rows.length > 0 && row.length !== rows[0]!.length) {
      return { ok: false, message: `this row has ${row.length} positions, the first row has ${rows[0]!.length}`, line: i + 1, column: Math.min(row.length, rows[0]!.length) + 1 };
    }
    rows.push(row);
  }
  const cols = rows[0]!.length;
  const cells: boolean[] = [];
  for (const row of rows) for (const ch of row) cells.push(ch === '#');
  return { ok: true, mask: { rows: rows.length, cols, cells } };
}

/** The text form: one line per row, each ending in a newline; parseMaskText reads it back. */
export function formatMaskText(mask: MaskModel): string {
  let out = '';
  for (let r = 0; r < mask.rows; r++) {
    for (let c = 0; c < mask.cols; c++) out += mask.cells[r * mask.cols + c] ? '#' : '.';
    out += '\n';
  }
  return out;
}

/** A full rows x cols rectangle. */
export const fullMask = (rows: number, cols: number): MaskModel => ({ rows, cols, cells: new Array<boolean>(rows * cols).fill(true) });

/** The same shape in a new box: positions inside both keep their state, new positions are cells. */
export function resizeMask(mask: MaskModel, rows: number, cols: number): MaskModel {
  const cells: boolean[] = [];
  for (let r = 0; r < rows; r++) for (let c = 0; c < cols; c++) cells.push(r < mask.rows && c < mask.cols ? mask.cells[r * mask.cols + c]! : true);
  return { rows, cols, cells };
}

export const cellCount = (mask: MaskModel) => mask.cells.reduce((n, on) => n + (on ? 1 : 0), 0);
