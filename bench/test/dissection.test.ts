import { gridGraph, verifyRanking } from '@cairn/engine';
import { describe, expect, it } from 'vitest';
import { dissectionLabels } from '../suites/grid';

describe('the benchmark\u2019s grid ranking', () => {
  it('is a ranking on grids of many shapes, so the benchmark verifies real rankings', () => {
    for (const [m, n] of [[1, 1], [1, 9], [2, 2], [3, 7], [8, 8], [13, 5], [40, 40]] as const) {
      expect(verifyRanking(gridGraph(m, n), dissectionLabels(m, n)).valid).toBe(true);
    }
  });
});
