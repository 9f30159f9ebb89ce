import { describe, expect, it } from 'vitest';
import { cycleGraph, EngineError, gridGraph, pathGraph, randomGraph, solve, staircaseGraph, verifyRanking } from '../src/index';
import { bruteForceTreeDepth } from './brute-force-td';

describe('solve', () => {
  it('answers a family with a closed form from the formula, with a ranking that meets it', () => {
    const r = solve(cycleGraph(20));
    // χr(C_20) = 2 + ⌊log2 19⌋ = 6 (Bodlaender et al., SIAM J. Discrete Math. 1998).
    expect(r).toMatchObject({ rankNumber: 6, lower: 6, upper: 6, verified: true, provenance: { value: 'formula:cycle' } });
    expect(verifyRanking(cycleGraph(20), r.labels)).toMatchObject({ valid: true, maxLabel: 6 });
    expect(solve(gridGraph(2, 9), { method: 'formula' })).toMatchObject({ rankNumber: 6, provenance: { value: 'formula:grid-2xn' }, verified: true });
  });

  it('settles small graphs by exact search, equal to the brute force', () => {
    for (const g of [gridGraph(3, 5), gridGraph(4, 4), staircaseGraph(5), randomGraph(14, 0.3, 4)]) {
      const r = solve(g);
      expect(r.rankNumber).toBe(bruteForceTreeDepth(g));
      expect(r.verified).toBe(true);
      expect(verifyRanking(g, r.labels).valid).toBe(true);
    }
  });

  it('with method bounds gives the interval of the constructions and lower bounds, each with its argument', () => {
    const r = solve(gridGraph(12, 12), { method: 'bounds' });
    expect(r.lower).toBeLessThanOrEqual(r.upper);
    expect(r.stats.nodes).toBe(0);
    expect(r.provenance.upper.construction).toMatch(/split|dissection/);
    expect(r.provenance.lower.argument.length).toBeGreaterThan(10);
    expect(verifyRanking(gridGraph(12, 12), r.labels)).toMatchObject({ valid: true, maxLabel: r.upper });
  });

  it('returns the best interval when the time limit comes first', () => {
    const r = solve(gridGraph(9, 9), { timeLimitMs: 100 });
    expect(r.rankNumber).toBeNull();
    expect(r.stats.stopReason).toBe('time-limit');
    expect(r.lower).toBeLessThan(r.upper);
    expect(r.provenance.value).toBe('bound');
  });

  it('refuses the formula method where no closed form applies', () => {
    expect(() => solve(gridGraph(3, 3), { method: 'formula' })).toThrow(EngineError);
    expect(solve(pathGraph(1)).rankNumber).toBe(1);
  });
});
