import type { SweepFamily } from '@cairn/schema';

/** Families whose transpose is the same graph: a cell with rows > cols shows its mirror cell's run. */
export const MIRRORED_FAMILIES: ReadonlySet<SweepFamily> = new Set(['grid', 'torus']);

export interface SweepRanges {
  family: SweepFamily;
  rowsFrom: number;
  rowsTo: number;
  colsFrom: number;
  colsTo: number;
}

/** One cell of the table: its sizes, and the sizes of the run that answers it (its mirror, if transposed). */
export interface PlannedCell {
  rows: number;
  cols: number;
  runRows: number;
  runCols: number;
}

/** Every cell of a sweep's table, row by row, each with the run that answers it. */
export function sweepCells(s: SweepRanges): PlannedCell[] {
  const cells: PlannedCell[] = [];
  const mirrored = MIRRORED_FAMILIES.has(s.family);
  for (let rows = s.rowsFrom; rows <= s.rowsTo; rows++) {
    for (let cols = s.colsFrom; cols <= s.colsTo; cols++) {
      const swap = mirrored && rows > cols;
      cells.push({ rows, cols, runRows: swap ? cols : rows, runCols: swap ? rows : cols });
    }
  }
  return cells;
}

/** The distinct runs behind the cells (a mirrored pair is one run). */
export function distinctRuns(cells: PlannedCell[]): { rows: number; cols: number }[] {
  const seen = new Map<string, { rows: number; cols: number }>();
  for (const c of cells) seen.set(`${c.runRows}x${c.runCols}`, { rows: c.runRows, cols: c.runCols });
  return [...seen.values()];
}
