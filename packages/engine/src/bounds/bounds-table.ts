import { formulaFor } from '../formulas/formula-for';
import { gridGraph } from '../families/grid';
import { SizeError } from '../errors';
import { gridLowerBounds } from './grid-lower-bounds';
import { MidlineSplit } from './midline-split';

/** One row of the bounds table: what Cairn can say of the m x n grid without search. */
export interface BoundsTableRow {
  rows: number;
  cols: number;
  /** The closed-form value where one applies (then lower = upper = formula). */
  formula: number | null;
  midlineSplit: number;
  lower: number;
  lowerArgument: string;
}

/**
 * The bounds side by side for every m <= n <= maxSize: the midline-split upper bound and the best
 * size-only lower bound (the data behind the bounds chart). Cheap: no rankings are built.
 */
export function boundsTable(maxSize: number): BoundsTableRow[] {
  if (!Number.isInteger(maxSize) || maxSize < 1 || maxSize > 10_000) throw new SizeError(`boundsTable needs a size 1..10000, got ${maxSize}`);
  const split = new MidlineSplit();
  const rows: BoundsTableRow[] = [];
  for (let m = 1; m <= maxSize; m++) {
    for (let n = m; n <= maxSize; n++) {
      const best = gridLowerBounds(m, n)[0]!;
      const formula = m <= 2 && m * n <= 1e7 ? (formulaFor(gridGraph(m, n))?.value ?? null) : null;
      rows.push({ rows: m, cols: n, formula, midlineSplit: split.value(m, n), lower: Math.max(best.value, formula ?? 0), lowerArgument: best.argument });
    }
  }
  return rows;
}
