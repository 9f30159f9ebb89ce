import { SizeError } from '../errors';
import { ANTI_DIAGONAL, DIAGONAL, forEachOnLine, rectangleBox, split } from './bevelled-box';
import { BevelledSplit } from './bevelled-split';
import type { UpperBound } from './upper-bound';

/** Up to this many positions per diagonal, every one is tried. */
const EVERY_POSITION = 64;

/** Where the diagonal split cuts the m x n grid, and the labels that takes. */
export interface DiagonalCut {
  value: number;
  /** 'anti': the cells with row + column = position; 'main': the cells with row - column = position. */
  diagonal: 'anti' | 'main';
  position: number;
  /** How many cells the cut holds. */
  cutSize: number;
}

/**
 * The diagonal split for m x n grids (Cairn's own construction, in the spirit of the near-square bounds
 * of arXiv:1208.1814 (2012), "On the rank number of grid graphs", but not taken from it): cut the grid
 * along one whole diagonal line of cells, row + column = e (or row - column = e). Each cell of the line
 * touches the next at a corner and every step between neighbours changes row + column by one, so the
 * line separates the cells below it from those above. Of the two pieces, one is a rectangle with a
 * staircase corner cut off (or a staircase, when the line reaches both long sides' ends) and the other
 * the same shape turned round; each is ranked by the staircase construction (BevelledSplit), and the
 * cut takes distinct labels above both. Both diagonals are tried at every position where the line runs
 * from one long side to the other (min(m, n) cells; shorter lines only clip a corner, which the staircase
 * construction tries inside the pieces); on grids far from square, only around the balance point.
 */
export class DiagonalSplit {
  constructor(private readonly split: BevelledSplit = new BevelledSplit()) {}

  /** The best diagonal cut of the m x n grid. */
  best(m: number, n: number): DiagonalCut {
    checkSize(m, n);
    const box = rectangleBox(m, n);
    const across = Math.min(m, n);
    let best: DiagonalCut | undefined;
    for (const kind of [ANTI_DIAGONAL, DIAGONAL]) {
      // The lines with min(m, n) cells are the |m - n| + 1 consecutive values in the middle of the range.
      const first = kind === ANTI_DIAGONAL ? across - 1 : Math.min(0, m - n);
      const last = first + Math.abs(m - n);
      const cutAt = (k: number): DiagonalCut => {
        const [below, above] = split(box, kind, k);
        const value = across + Math.max(this.split.value(below), this.split.value(above));
        return { value, diagonal: kind === ANTI_DIAGONAL ? 'anti' : 'main', position: k, cutSize: across };
      };
      for (const k of this.positions(box, kind, first, last)) {
        const cut = cutAt(k);
        if (!best || cut.value < best.value) best = cut;
      }
    }
    return best!;
  }

  /**
   * The positions tried on one diagonal: all of them when there are at most EVERY_POSITION, else those
   * around where the two pieces' heights cross, found by bisection (one piece only grows and the other
   * only shrinks as the line moves), so long thin grids cost a logarithm, not their length.
   */
  private positions(box: number[], kind: number, first: number, last: number): number[] {
    const all = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => from + i);
    if (last - first + 1 <= EVERY_POSITION) return all(first, last);
    let a = first;
    let z = last;
    while (a < z) {
      const mid = (a + z) >> 1;
      const [below, above] = split(box, kind, mid);
      if (this.split.value(below) >= this.split.value(above)) z = mid;
      else a = mid + 1;
    }
    return all(Math.max(first, a - 2), Math.min(last, a + 2));
  }

  /** The number of labels the diagonal split uses on the m x n grid. */
  value(m: number, n: number): number {
    return this.best(m, n).value;
  }

  /** The diagonal-split ranking of the m x n grid (row-major labels, as gridGraph numbers vertices). */
  ranking(m: number, n: number): UpperBound {
    const cut = this.best(m, n);
    const box = rectangleBox(m, n);
    const kind = cut.diagonal === 'anti' ? ANTI_DIAGONAL : DIAGONAL;
    const labels = new Int32Array(m * n);
    const put = (x: number, y: number, label: number) => {
      labels[x * n + y] = label;
    };
    const [below, above] = split(box, kind, cut.position);
    let top = Math.max(this.split.label(below, put), this.split.label(above, put));
    forEachOnLine(box, kind, cut.position, (x, y) => put(x, y, ++top));
    const line = cut.diagonal === 'anti' ? `row + column = ${cut.position}` : `row - column = ${cut.position}`;
    return {
      value: top,
      labels,
      construction: 'diagonal-split',
      argument: `cut the ${cut.cutSize} cells with ${line}, which separate the grid; rank both pieces by the staircase construction and give the cut distinct labels above them (${top} labels)`,
    };
  }
}

function checkSize(m: number, n: number): void {
  if (!Number.isInteger(m) || !Number.isInteger(n) || m < 1 || n < 1) throw new SizeError(`the diagonal split needs a grid of whole sizes >= 1, got ${m} x ${n}`);
  if (m * n > 1e8) throw new SizeError(`the diagonal split: ${m} x ${n} is more cells than it labels (10^8)`);
}

/** The diagonal-split upper bound for the m x n grid, with its ranking. */
export function diagonalSplitRanking(m: number, n: number): UpperBound {
  return new DiagonalSplit().ranking(m, n);
}
