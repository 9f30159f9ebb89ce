import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { completeBipartiteGraph, completeGraph, graphFromEdges, gridGraph, randomGraph } from '../../src/index';
import { checkLowerBoundWitness, cliqueBound } from '../../src/bounds/lower/index';
import { arbitrarySmallGraph, bruteForceCliqueNumber } from './support';

describe('cliqueBound', () => {
  it('gives n on K_n (every two vertices adjacent, so all labels differ; common practice)', () => {
    for (let n = 1; n <= 40; n++) {
      const g = completeGraph(n);
      const b = cliqueBound(g);
      expect(b.value).toBe(n);
      expect(b.witness).toEqual({ kind: 'clique', vertices: Array.from({ length: n }, (_, i) => i) });
      expect(checkLowerBoundWitness(g, b)).toEqual({ ok: true });
    }
  });

  it('agrees with a brute-force maximum clique on random graphs of <= 14 vertices', () => {
    fc.assert(
      fc.property(arbitrarySmallGraph(14), (g) => {
        const b = cliqueBound(g);
        expect(b.value).toBe(bruteForceCliqueNumber(g));
        expect(checkLowerBoundWitness(g, b)).toEqual({ ok: true });
        expect(b.argument).toContain('maximum');
      }),
      { numRuns: 1000 },
    );
  });

  it('finds the planted clique in a larger random graph, and says it finished', () => {
    const base = randomGraph(200, 0.05, 9);
    const pairs = [...base.edges()].flat();
    const planted = [3, 17, 40, 41, 99, 120, 150, 180, 199];
    for (const u of planted) for (const v of planted) if (u < v) pairs.push(u, v);
    const g = graphFromEdges(200, pairs);
    const b = cliqueBound(g);
    expect(b.value).toBe(planted.length);
    expect(b.witness).toEqual({ kind: 'clique', vertices: planted });
    expect(b.argument).toContain('maximum');
  });

  it('stays valid and says so when the budget runs out', () => {
    const g = randomGraph(120, 0.5, 4);
    const b = cliqueBound(g, { budget: 500 });
    expect(checkLowerBoundWitness(g, b)).toEqual({ ok: true });
    expect(b.argument).toContain('budget');
    expect(b.value).toBeLessThanOrEqual(cliqueBound(g).value);
  });

  it('gives 2 on bipartite graphs with an edge and 1 without edges', () => {
    expect(cliqueBound(gridGraph(30, 30)).value).toBe(2);
    expect(cliqueBound(completeBipartiteGraph(5, 7)).value).toBe(2);
    expect(cliqueBound(graphFromEdges(5, [])).value).toBe(1);
    expect(cliqueBound(graphFromEdges(0, [])).value).toBe(0);
  });
});
