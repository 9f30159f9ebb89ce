import { describe, expect, it } from 'vitest';
import { cycleGraph, gridGraph, solve, staircaseGraph } from '@cairn/engine';
import { SolveResult } from '@cairn/schema';

describe('solve results and the SolveResult schema', () => {
  it('agree, for a closed form, an exact search, bounds only and a stopped search', () => {
    for (const r of [
      solve(cycleGraph(12)),
      solve(staircaseGraph(4)),
      solve(gridGraph(10, 10), { method: 'bounds' }),
      solve(gridGraph(9, 9), { timeLimitMs: 50 }),
    ]) {
      const parsed = SolveResult.safeParse(r);
      expect(parsed.success, parsed.success ? '' : JSON.stringify(parsed.error.issues)).toBe(true);
    }
  });
});
