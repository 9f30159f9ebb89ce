/** Where each vertex of a grid-like graph sits: row and column, in the engine's vertex numbering. */
export interface CellLayout {
  rows: number;
  cols: number;
  /** cellOf[v] = row * cols + col of vertex v. */
  cellOf: Int32Array;
}

/** A full rows x cols grid, numbered row by row (the engine's grid numbering). */
export function gridLayout(rows: number, cols: number): CellLayout {
  const cellOf = new Int32Array(rows * cols);
  for (let v = 0; v < cellOf.length; v++) cellOf[v] = v;
  return { rows, cols, cellOf };
}

/**
 * A mask (`#` a cell, `.` a hole, one line per row), numbered row by row over the cells only — the
 * order in which the engine numbers a mask's vertices.
 */
export function maskLayout(text: string): CellLayout {
  const lines = text.split(/\r?\n/).filter((l) => l.trim().length > 0).map((l) => l.trim());
  const rows = lines.length;
  const cols = Math.max(0, ...lines.map((l) => l.length));
  const cells: number[] = [];
  lines.forEach((line, r) => {
    for (let c = 0; c < line.length; c++) if (line[c] === '#') cells.push(r * cols + c);
  });
  return { rows, cols, cellOf: Int32Array.from(cells) };
}

/** The staircase S(t): cells (i, j) with i + j < t, numbered row by row. */
export function staircaseLayout(t: number): CellLayout {
  const cells: number[] = [];
  for (let i = 0; i < t; i++) for (let j = 0; i + j < t; j++) cells.push(i * t + j);
  return { rows: t, cols: t, cellOf: Int32Array.from(cells) };
}
