import { floorLog2, grid2RankNumber } from '../formulas/closed-forms';
import { SizeError } from '../errors';

/** A lower bound on the rank number of the rows x cols grid, from its size alone, with its argument. */
export interface GridLowerBound {
  value: number;
  argument: string;
}

/**
 * Every size-only lower bound Cairn knows for the m x n grid, best first:
 * - the snake through all mn cells is a path, so χr >= ⌊log2 mn⌋ + 1 (path form, Bodlaender et al. 1998);
 * - χr >= tw + 1 and tw(P_m x P_n) = min(m, n) for m, n >= 2 (standard);
 * - the grid holds a 2 x max(m, n) rectangle, and χr never grows on subgraphs, so χr >= the 2 x n closed
 *   form (Alpert 2010).
 */
export function gridLowerBounds(rows: number, cols: number): GridLowerBound[] {
  if (!Number.isInteger(rows) || !Number.isInteger(cols) || rows < 1 || cols < 1) {
    throw new SizeError(`gridLowerBounds needs whole sizes >= 1, got ${rows} x ${cols}`);
  }
  const short = Math.min(rows, cols);
  const long = Math.max(rows, cols);
  const out: GridLowerBound[] = [
    { value: floorLog2(rows * cols) + 1, argument: `a path through all ${rows * cols} cells: ⌊log2 ${rows * cols}⌋ + 1 (Bodlaender et al. 1998)` },
  ];
  if (short >= 2) {
    out.push({ value: short + 1, argument: `treewidth ${short} of the grid, plus one (td >= tw + 1)` });
    out.push({ value: grid2RankNumber(long), argument: `contains the 2 x ${long} grid, whose rank number is ${grid2RankNumber(long)} (Alpert 2010)` });
  }
  return out.sort((a, b) => b.value - a.value);
}
