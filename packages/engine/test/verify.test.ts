import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { graphFromEdges, gridGraph, LabelError, pathGraph, verifyRanking } from '../src/index';
import { adjacency, arbitraryGraph, isRankingByDefinition, rulerLabels, toGraph } from './support';

describe('verifyRanking', () => {
  it('accepts the ruler labelling of P_n with floor(log2 n) + 1 labels (Bodlaender et al., "Rankings of graphs", SIAM J. Discrete Math. 1998)', () => {
    for (let n = 1; n <= 300; n++) {
      expect(verifyRanking(pathGraph(n), rulerLabels(n))).toMatchObject({ valid: true, labelsUsed: Math.floor(Math.log2(n)) + 1 });
    }
  });

  it('names two equal labels and a path between them whose inner labels are all smaller', () => {
    const g = pathGraph(5);
    expect(verifyRanking(g, [2, 1, 3, 1, 2]).valid).toBe(true);
    const bad = verifyRanking(g, [3, 1, 2, 1, 3]);
    expect(bad).toMatchObject({ valid: false, labelsUsed: 3, violation: { label: 3 } });
    if (bad.valid) return;
    expect([bad.violation.u, bad.violation.v].sort()).toEqual([0, 4]);
    expect(bad.violation.path.length).toBe(5);
  });

  it('picks a clash with smaller inner labels even when a third equal label sits between', () => {
    // 0 - 1 - 2 with labels 1 1 1: the reported pair must be adjacent, not 0 and 2 through 1.
    const verdict = verifyRanking(pathGraph(3), [1, 1, 1]);
    if (verdict.valid) throw new Error('expected a violation');
    expect(verdict.violation.path).toHaveLength(2);
  });

  it('agrees with the definition read literally on 2000 random graphs and labellings (fast-check)', () => {
    fc.assert(
      fc.property(
        arbitraryGraph(9).chain(([n, pairs]) => fc.tuple(fc.constant(n), fc.constant(pairs), fc.array(fc.integer({ min: 1, max: 5 }), { minLength: n, maxLength: n }))),
        ([n, pairs, labels]) => {
          const g = toGraph([n, pairs]);
          const verdict = verifyRanking(g, labels);
          expect(verdict.valid).toBe(isRankingByDefinition(adjacency(n, pairs), labels));
          if (!verdict.valid) {
            const { u, v, path, label } = verdict.violation;
            expect(labels[u]).toBe(label);
            expect(labels[v]).toBe(label);
            expect(path[0]).toBe(u);
            expect(path[path.length - 1]).toBe(v);
            for (let i = 1; i < path.length; i++) expect(g.hasEdge(path[i - 1]!, path[i]!)).toBe(true);
            for (const x of path.slice(1, -1)) expect(labels[x]).toBeLessThan(label);
          }
        },
      ),
      { numRuns: 2000 },
    );
  });

  it('reads labels far larger than the vertex count the same way', () => {
    const labels = rulerLabels(100);
    expect(verifyRanking(pathGraph(100), labels.map((l) => l * 10_000_000))).toMatchObject({ valid: true, labelsUsed: 7 });
    expect(verifyRanking(pathGraph(3), [2e9, 1e9, 2e9]).valid).toBe(false);
  });

  it('treats labels that are not one whole number >= 1 per vertex as a LabelError, not a verdict', () => {
    expect(() => verifyRanking(pathGraph(3), [1, 0, 1])).toThrow(LabelError);
    expect(() => verifyRanking(pathGraph(3), [1, 0, 1])).toThrow(/vertex 1/);
    expect(() => verifyRanking(pathGraph(3), [1, 2])).toThrow(/expected 3 labels/);
    expect(() => verifyRanking(pathGraph(2), [1, 1.5])).toThrow(LabelError);
    expect(() => verifyRanking(pathGraph(2), [1, Number.NaN])).toThrow(LabelError);
  });

  it('checks an empty graph and a graph without edges', () => {
    expect(verifyRanking(graphFromEdges(0, []), [])).toMatchObject({ valid: true, labelsUsed: 0 });
    expect(verifyRanking(graphFromEdges(3, []), [1, 1, 1])).toMatchObject({ valid: true, labelsUsed: 1 });
  });

  it('rejects the all-ones labelling of a grid at an edge', () => {
    const g = gridGraph(3, 3);
    const verdict = verifyRanking(g, new Array(9).fill(1));
    expect(verdict.valid).toBe(false);
  });
});
