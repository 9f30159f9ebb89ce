import { beforeAll, describe, expect, it } from 'vitest';
import {
  BevelledSplit,
  DiagonalSplit,
  diagonalSplitRanking,
  exactTreeDepth,
  formulaFor,
  gridGraph,
  MidlineSplit,
  verifyRanking,
} from '../src/index';

const maxLabel = (labels: Int32Array) => labels.reduce((a, b) => Math.max(a, b), 0);

/** Exact rank numbers of the grids with 3 <= m <= n and mn <= 30, by the engine's exact search. */
const exact = new Map<string, number>();
beforeAll(() => {
  for (let m = 3; m <= 5; m++) {
    for (let n = m; m * n <= 30; n++) {
      const r = exactTreeDepth(gridGraph(m, n));
      if (r.status !== 'exact') throw new Error(`exact search did not finish on ${m} x ${n}`);
      exact.set(`${m}x${n}`, r.upper);
    }
  }
}, 180_000);

describe('diagonal split', () => {
  it('gives a ranking that passes the verifier and uses exactly its value, for every m, n <= 30', () => {
    const diagonal = new DiagonalSplit(new BevelledSplit());
    for (let m = 1; m <= 30; m++) {
      for (let n = 1; n <= 30; n++) {
        const bound = diagonal.ranking(m, n);
        const verdict = verifyRanking(gridGraph(m, n), bound.labels);
        expect(verdict.valid, `${m}x${n}`).toBe(true);
        expect(maxLabel(bound.labels), `${m}x${n}`).toBe(bound.value);
        expect(diagonal.value(m, n), `${m}x${n}`).toBe(bound.value);
      }
    }
  });

  it('cuts one whole diagonal line from long side to long side, and gives its cells the top labels', () => {
    const diagonal = new DiagonalSplit(new BevelledSplit());
    for (const [m, n] of [[5, 5], [7, 9], [12, 8], [20, 23], [1, 6], [2, 2]] as const) {
      const cut = diagonal.best(m, n);
      const bound = diagonal.ranking(m, n);
      expect(cut.cutSize).toBe(Math.min(m, n));
      const onLine = (r: number, c: number) => (cut.diagonal === 'anti' ? r + c : r - c) === cut.position;
      for (let r = 0; r < m; r++) {
        for (let c = 0; c < n; c++) {
          const top = bound.labels[r * n + c]! > bound.value - cut.cutSize;
          expect(top, `${m}x${n} cell ${r},${c}`).toBe(onLine(r, c));
        }
      }
    }
  });

  it('is never below the exact rank number (exact search, mn <= 30) nor the 2 x n closed form (Alpert 2010)', () => {
    const diagonal = new DiagonalSplit(new BevelledSplit());
    for (const [size, td] of exact) {
      const [m, n] = size.split('x').map(Number) as [number, number];
      expect(diagonal.value(m, n), size).toBeGreaterThanOrEqual(td);
      expect(diagonal.value(n, m), `${n}x${m}`).toBeGreaterThanOrEqual(td);
    }
    for (let n = 1; n <= 200; n++) {
      // χr(P_2 × P_n) = ⌊log2(n + 1)⌋ + ⌊log2((n + 1)/3)⌋ + 2: M. Alpert, "Rank numbers of grid graphs", Discrete Math. 2010.
      expect(diagonal.value(2, n), `2x${n}`).toBeGreaterThanOrEqual(formulaFor(gridGraph(2, n))!.value);
    }
  });

  it('beats the midline split on every near-square grid from 4 x 4 to 30 x 32', () => {
    const diagonal = new DiagonalSplit(new BevelledSplit());
    const midline = new MidlineSplit();
    for (let n = 4; n <= 30; n++) {
      for (const cols of [n, n + 1, n + 2]) expect(diagonal.value(n, cols), `${n}x${cols}`).toBeLessThan(midline.value(n, cols));
    }
    // Below 4 x 4 the two can tie: on 3 x 3 both use 5 labels, the exact value found by search.
    expect(diagonal.value(3, 3)).toBe(midline.value(3, 3));
    expect(diagonal.value(3, 3)).toBe(exact.get('3x3'));
  });

  it('ranks the 1000 x 1000 grid', () => {
    const bound = diagonalSplitRanking(1000, 1000);
    expect(verifyRanking(gridGraph(1000, 1000), bound.labels)).toMatchObject({ valid: true, maxLabel: bound.value });
    expect(bound.value).toBeLessThan(new MidlineSplit().value(1000, 1000));
  });
});

describe('bevelled split of a whole rectangle', () => {
  it('gives a ranking that passes the verifier, for every m, n <= 30', () => {
    const split = new BevelledSplit();
    for (let m = 1; m <= 30; m++) {
      for (let n = 1; n <= 30; n++) {
        const bound = split.rectangleRanking(m, n);
        expect(verifyRanking(gridGraph(m, n), bound.labels), `${m}x${n}`).toMatchObject({ valid: true, maxLabel: bound.value });
      }
    }
  });

  it('is never below the exact rank number, nor the 2 x n closed form (Alpert 2010), nor above the midline split (m, n <= 60)', () => {
    const split = new BevelledSplit();
    for (const [size, td] of exact) {
      const [m, n] = size.split('x').map(Number) as [number, number];
      expect(split.rectangleRanking(m, n).value, size).toBeGreaterThanOrEqual(td);
    }
    for (let n = 1; n <= 200; n++) expect(split.rectangleRanking(2, n).value, `2x${n}`).toBeGreaterThanOrEqual(formulaFor(gridGraph(2, n))!.value);
    const midline = new MidlineSplit();
    const box = (m: number, n: number) => [0, m - 1, 0, n - 1, 0, m + n - 2, -(n - 1), m - 1];
    for (let m = 1; m <= 60; m++) for (let n = m; n <= 60; n++) expect(split.value(box(m, n)), `${m}x${n}`).toBeLessThanOrEqual(midline.value(m, n));
  });
});
