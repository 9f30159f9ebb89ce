import { floorLog2 } from '../formulas/closed-forms';
import { SizeError } from '../errors';
import type { UpperBound } from './upper-bound';

/**
 * Midline split for the rows x cols grid: cut one whole row or column, rank both sides, and give the cut
 * distinct labels above both (classic nested dissection; td(G) <= |S| + max td(G - S) for a separator S).
 * f(a, b) = min(a + f(a, ⌈(b - 1)/2⌉), b + f(⌈(a - 1)/2⌉, b)), f(1, b) = ⌊log2 b⌋ + 1 (a path).
 * f grows with each side, so among all cut positions the middle one is best, and the dynamic program
 * over rectangle sizes only visits O(log rows · log cols) sizes (the tests check this against trying
 * every position).
 */
export class MidlineSplit {
  private readonly memo = new Map<number, number>();

  /** The number of labels the midline split uses on an a x b grid. */
  value(a: number, b: number): number {
    if (a <= 0 || b <= 0) return 0;
    if (a > b) [a, b] = [b, a];
    if (a === 1) return floorLog2(b) + 1;
    const key = a * 100_000_007 + b;
    const known = this.memo.get(key);
    if (known !== undefined) return known;
    const cutCols = a + this.value(a, Math.ceil((b - 1) / 2));
    const cutRows = b + this.value(Math.ceil((a - 1) / 2), b);
    const best = Math.min(cutCols, cutRows);
    this.memo.set(key, best);
    return best;
  }

  /** The midline-split ranking of the rows x cols grid (row-major labels). */
  ranking(rows: number, cols: number): UpperBound {
    if (!Number.isInteger(rows) || !Number.isInteger(cols) || rows < 1 || cols < 1) {
      throw new SizeError(`midline split needs a grid of whole sizes >= 1, got ${rows} x ${cols}`);
    }
    if (rows * cols > 1e8) throw new SizeError(`midline split: ${rows} x ${cols} is more cells than it labels (10^8)`);
    const labels = new Int32Array(rows * cols);
    const fill = (r0: number, c0: number, h: number, w: number): number => {
      if (h <= 0 || w <= 0) return 0;
      if (h === 1 || w === 1) {
        const len = Math.max(h, w);
        for (let i = 0; i < len; i++) {
          const x = i + 1;
          labels[h === 1 ? r0 * cols + c0 + i : (r0 + i) * cols + c0] = 32 - Math.clz32(x & -x); // ruler labels
        }
        return floorLog2(len) + 1;
      }
      const a = Math.min(h, w);
      const b = Math.max(h, w);
      const target = this.value(a, b);
      // Cut across the long side (a cells) or the short side (b cells), whichever the program chose.
      const acrossLong = a + this.value(a, Math.ceil((b - 1) / 2)) === target;
      const cutColumn = acrossLong === w >= h;
      let top: number;
      if (cutColumn) {
        const left = (w - 1) >> 1;
        const mid = c0 + left;
        top = Math.max(fill(r0, c0, h, left), fill(r0, mid + 1, h, w - left - 1));
        for (let r = 0; r < h; r++) labels[(r0 + r) * cols + mid] = ++top;
      } else {
        const upper = (h - 1) >> 1;
        const mid = r0 + upper;
        top = Math.max(fill(r0, c0, upper, w), fill(mid + 1, c0, h - upper - 1, w));
        for (let c = 0; c < w; c++) labels[mid * cols + c0 + c] = ++top;
      }
      return top;
    };
    const value = fill(0, 0, rows, cols);
    return {
      value,
      labels,
      construction: 'midline-split',
      argument: `cut a middle row or column of each rectangle, recursively; the cut takes distinct labels above both sides (${value} labels)`,
    };
  }
}

/** The midline-split upper bound for the rows x cols grid, with its ranking. */
export function midlineSplitRanking(rows: number, cols: number): UpperBound {
  return new MidlineSplit().ranking(rows, cols);
}
