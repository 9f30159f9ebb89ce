import { describe, expect, it } from 'vitest';
import { formulaFor, gridGraph, MidlineSplit, midlineSplitRanking, verifyRanking } from '../src/index';
import { bruteForceTreeDepth } from './brute-force-td';

/** The same dynamic program trying every row and column position, to check that the middle is best. */
function everyPosition(rows: number, cols: number): number {
  const memo = new Map<string, number>();
  const f = (a: number, b: number): number => {
    if (a <= 0 || b <= 0) return 0;
    if (a === 1 || b === 1) return Math.floor(Math.log2(Math.max(a, b))) + 1;
    const key = `${a},${b}`;
    const known = memo.get(key);
    if (known !== undefined) return known;
    let best = Infinity;
    for (let k = 0; k < b; k++) best = Math.min(best, a + Math.max(f(a, k), f(a, b - 1 - k)));
    for (let k = 0; k < a; k++) best = Math.min(best, b + Math.max(f(k, b), f(a - 1 - k, b)));
    memo.set(key, best);
    return best;
  };
  return f(rows, cols);
}

describe('midline split', () => {
  it('gives a ranking that passes the verifier and uses exactly its value, for every m, n <= 30', () => {
    const split = new MidlineSplit();
    for (let m = 1; m <= 30; m++) {
      for (let n = 1; n <= 30; n++) {
        const bound = midlineSplitRanking(m, n);
        const verdict = verifyRanking(gridGraph(m, n), bound.labels);
        expect(verdict.valid, `${m}x${n}`).toBe(true);
        expect(Math.max(...bound.labels)).toBe(bound.value);
        expect(bound.value).toBe(split.value(m, n));
      }
    }
  });

  it('finds the best straight cut: the middle is never beaten by another position (m, n <= 40)', () => {
    const split = new MidlineSplit();
    for (let m = 1; m <= 40; m++) for (let n = m; n <= 40; n++) expect(split.value(m, n), `${m}x${n}`).toBe(everyPosition(m, n));
  });

  it('is never below the rank number (brute force for small grids; the 2 x n form of Alpert 2010)', () => {
    for (const [m, n] of [[2, 2], [2, 5], [3, 3], [3, 6], [4, 4], [4, 5]] as const) {
      expect(new MidlineSplit().value(m, n)).toBeGreaterThanOrEqual(bruteForceTreeDepth(gridGraph(m, n)));
    }
    for (let n = 1; n <= 200; n++) expect(new MidlineSplit().value(2, n)).toBeGreaterThanOrEqual(formulaFor(gridGraph(2, n))!.value);
  });

  it('labels a 2000 x 2000 grid', () => {
    const bound = midlineSplitRanking(2000, 2000);
    expect(verifyRanking(gridGraph(2000, 2000), bound.labels).valid).toBe(true);
  });
});
