import { formulaFor } from '../formulas/formula-for';
import { gridGraph } from '../families/grid';
import { SizeError } from '../errors';
import { BevelledSplit } from './bevelled-split';
import { DiagonalSplit } from './diagonal-split';
import { gridLowerBounds } from './grid-lower-bounds';
import { MidlineSplit } from './midline-split';

/** One row of the bounds table: what Cairn can say of the m x n grid without search. */
export interface BoundsTableRow {
  rows: number;
  cols: number;
  /** The closed-form value where one applies (then lower = upper = formula). */
  formula: number | null;
  midlineSplit: number;
  /** The diagonal split's number of labels (a ranking with that many exists; see DiagonalSplit). */
  diagonalSplit: number;
  lower: number;
  lowerArgument: string;
}

/**
 * The bounds side by side for every m <= n <= maxSize: the midline-split and diagonal-split upper
 * bounds and the best size-only lower bound (the data behind the bounds chart). No rankings are built;
 * the diagonal split's program is shared by all rows, so the whole table costs about what its largest
 * grids do.
 */
export function boundsTable(maxSize: number): BoundsTableRow[] {
  if (!Number.isInteger(maxSize) || maxSize < 1 || maxSize > 10_000) throw new SizeError(`boundsTable needs a size 1..10000, got ${maxSize}`);
  const midline = new MidlineSplit();
  const diagonal = new DiagonalSplit(new BevelledSplit());
  const rows: BoundsTableRow[] = [];
  for (let m = 1; m <= maxSize; m++) {
    for (let n = m; n <= maxSize; n++) {
      const best = gridLowerBounds(m, n)[0]!;
      const formula = m <= 2 && m * n <= 1e7 ? (formulaFor(gridGraph(m, n))?.value ?? null) : null;
      rows.push({
        rows: m,
        cols: n,
        formula,
        midlineSplit: midline.value(m, n),
        diagonalSplit: diagonal.value(m, n),
        lower: Math.max(best.value, formula ?? 0),
        lowerArgument: best.argument,
      });
    }
  }
  return rows;
}

/** The rows of a bounds table where the diagonal split uses fewer labels than the midline split. */
export function diagonalSplitWins(table: readonly BoundsTableRow[]): BoundsTableRow[] {
  return table.filter((row) => row.diagonalSplit < row.midlineSplit);
}
