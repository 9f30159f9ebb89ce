import { describe, expect, it } from 'vitest';
import { exactTreeDepth, FourRowDoubling, fourRowDoublingRanking, formulaFor, gridGraph, MidlineSplit, verifyRanking } from '../src/index';

const maxLabel = (labels: Int32Array) => labels.reduce((a, b) => Math.max(a, b), 0);

describe('four-row doubling', () => {
  it('gives a ranking of the 4 x n grid that passes the verifier and uses exactly its value, for every n <= 200', () => {
    const doubling = new FourRowDoubling();
    for (let n = 1; n <= 200; n++) {
      const bound = doubling.ranking(n);
      const verdict = verifyRanking(gridGraph(4, n), bound.labels);
      expect(verdict.valid, `4x${n}`).toBe(true);
      expect(maxLabel(bound.labels), `4x${n}`).toBe(bound.value);
      expect(doubling.value(n)).toBe(bound.value);
    }
  });

  it('ranks n x 4 grids too, in their own numbering', () => {
    const doubling = new FourRowDoubling();
    for (let n = 1; n <= 60; n++) {
      const bound = doubling.gridRanking(n, 4);
      expect(verifyRanking(gridGraph(n, 4), bound.labels), `${n}x4`).toMatchObject({ valid: true, maxLabel: doubling.value(n) });
    }
  });

  it('is never below the exact rank number (exact search, n <= 7), and meets it there', () => {
    const doubling = new FourRowDoubling();
    for (let n = 1; n <= 7; n++) {
      const exact = exactTreeDepth(gridGraph(4, n));
      expect(exact.status).toBe('exact');
      expect(doubling.value(n), `4x${n}`).toBeGreaterThanOrEqual(exact.upper);
      // What the construction achieves, not what a bound needs: losing it would be a regression.
      expect(doubling.value(n), `4x${n}`).toBe(exact.upper);
    }
  }, 60_000);

  it('is never below the 2 x n closed form its grid contains (Alpert 2010; χr never grows on subgraphs)', () => {
    const doubling = new FourRowDoubling();
    for (const n of [...Array.from({ length: 300 }, (_, i) => i + 1), 1000, 4095, 10_000]) {
      // χr(P_2 × P_n) = ⌊log2(n + 1)⌋ + ⌊log2((n + 1)/3)⌋ + 2: M. Alpert, "Rank numbers of grid graphs", Discrete Math. 2010.
      expect(doubling.value(n), `4x${n}`).toBeGreaterThanOrEqual(formulaFor(gridGraph(2, n))!.value);
    }
  });

  it('grows by at most the 4 cells of one middle cut when the length doubles, and never needs more than the midline split', () => {
    const doubling = new FourRowDoubling();
    const midline = new MidlineSplit();
    for (let n = 1; n <= 1000; n++) {
      // Two blocks of length n and one straight middle column make the 4 x (2n + 1) grid.
      expect(doubling.value(2 * n + 1), `4x${2 * n + 1}`).toBeLessThanOrEqual(doubling.value(n) + 4);
      expect(doubling.value(n), `4x${n}`).toBeLessThanOrEqual(midline.value(4, n));
    }
  });

  it('ranks the 4 x 10^4 grid', () => {
    const bound = fourRowDoublingRanking(10_000);
    expect(verifyRanking(gridGraph(4, 10_000), bound.labels)).toMatchObject({ valid: true, maxLabel: bound.value });
    expect(bound.value).toBeLessThan(new MidlineSplit().value(4, 10_000));
  });
});
