import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lineGraph, verifyEdgeRanking } from '../../src/edge/index';
import { graphFromEdges, LabelError, pathGraph, starGraph, verifyRanking, type Graph } from '../../src/index';
import { arbitraryGraph, rulerLabels, toGraph } from '../support';

/** A random graph with one label in 1..maxLabel per edge (labels drawn for the most edges it can have). */
const graphAndEdgeLabels = (maxN: number, maxLabel: number) =>
  arbitraryGraph(maxN).chain((data) =>
    fc.tuple(fc.constant(data), fc.array(fc.integer({ min: 1, max: maxLabel }), { minLength: (maxN * (maxN - 1)) / 2, maxLength: (maxN * (maxN - 1)) / 2 })),
  );

/**
 * The definition read literally, on g itself: for two edges e, f with the same label l, look for a simple
 * path whose first edge is e, whose last is f and whose inner edges are all below l.
 */
function isEdgeRankingByDefinition(g: Graph, labels: number[]): boolean {
  const list = [...g.edges()];
  const edgeOf = new Map(list.map(([u, v], i) => [`${u},${v}`, i]));
  const edgeBetween = (u: number, v: number) => edgeOf.get(u < v ? `${u},${v}` : `${v},${u}`)!;
  for (let e = 0; e < list.length; e++) {
    for (let f = e + 1; f < list.length; f++) {
      const l = labels[e]!;
      if (labels[f] !== l) continue;
      const [fu, fv] = list[f]!;
      // Walk simple paths from each end of e (entered through e) through edges below l to an end of f.
      for (const [from, start] of [list[e]!, [list[e]![1], list[e]![0]] as [number, number]]) {
        const onPath = new Set([from, start]);
        const walk = (x: number): boolean => {
          for (const [near, far] of [[fu, fv], [fv, fu]] as const) if (x === near && !onPath.has(far)) return true;
          for (const y of g.neighbours(x)) {
            if (onPath.has(y) || labels[edgeBetween(x, y)]! >= l) continue;
            onPath.add(y);
            if (walk(y)) return true;
            onPath.delete(y);
          }
          return false;
        };
        if (walk(start)) return false;
      }
    }
  }
  return true;
}

describe('verifyEdgeRanking', () => {
  it('agrees with verifyRanking on the line graph on 2000 random graphs and labellings (fast-check)', () => {
    fc.assert(
      fc.property(graphAndEdgeLabels(9, 5), ([data, pool]) => {
        const g = toGraph(data);
        const labels = pool.slice(0, g.edgeCount);
        const verdict = verifyEdgeRanking(g, labels);
        const onLine = verifyRanking(lineGraph(g).graph, labels);
        expect(verdict.valid).toBe(onLine.valid);
        expect(verdict.labelsUsed).toBe(onLine.labelsUsed);
        expect(verdict.maxLabel).toBe(onLine.maxLabel);
      }),
      { numRuns: 2000 },
    );
  });

  it('agrees with the definition read literally (simple paths of g) and names a true offending path (1500 runs, fast-check)', () => {
    fc.assert(
      fc.property(graphAndEdgeLabels(7, 4), ([data, pool]) => {
        const g = toGraph(data);
        const labels = pool.slice(0, g.edgeCount);
        const verdict = verifyEdgeRanking(g, labels);
        expect(verdict.valid).toBe(isEdgeRankingByDefinition(g, labels));
        if (verdict.valid) return;
        const { label, e, f, path, edges } = verdict.violation;
        const list = [...g.edges()];
        expect(e).not.toBe(f);
        expect(labels[e]).toBe(label);
        expect(labels[f]).toBe(label);
        expect(edges[0]).toBe(e);
        expect(edges[edges.length - 1]).toBe(f);
        expect(path).toHaveLength(edges.length + 1);
        expect(new Set(path).size).toBe(path.length); // a simple path
        for (let k = 0; k < edges.length; k++) {
          const [u, v] = list[edges[k]!]!;
          expect([u, v]).toEqual([Math.min(path[k]!, path[k + 1]!), Math.max(path[k]!, path[k + 1]!)]);
        }
        for (const inner of edges.slice(1, -1)) expect(labels[inner]).toBeLessThan(label);
      }),
      { numRuns: 1500 },
    );
  });

  it('accepts the ruler labelling of the n - 1 edges of P_n, with floor(log2(n - 1)) + 1 labels (L(P_n) = P_(n-1); Bodlaender et al., SIAM J. Discrete Math. 1998)', () => {
    for (let n = 2; n <= 200; n++) {
      expect(verifyEdgeRanking(pathGraph(n), rulerLabels(n - 1))).toMatchObject({ valid: true, labelsUsed: Math.floor(Math.log2(n - 1)) + 1 });
    }
  });

  it('reports two adjacent edges with one label as a two-edge path, far end first', () => {
    const verdict = verifyEdgeRanking(starGraph(3), [1, 2, 1]);
    if (verdict.valid) throw new Error('expected a violation');
    expect(verdict.violation).toMatchObject({ label: 1, e: 0, f: 2, path: [1, 0, 3], edges: [0, 2] });
    expect(verifyEdgeRanking(starGraph(3), [1, 2, 3])).toEqual({ valid: true, labelsUsed: 3, maxLabel: 3 });
  });

  it('finds a clash through smaller labels and none past a larger one', () => {
    // 0-1-2-3-4 with labels 2 1 3 2: edges 0 and 3 are separated by the 3.
    expect(verifyEdgeRanking(pathGraph(5), [2, 1, 3, 2]).valid).toBe(true);
    const bad = verifyEdgeRanking(pathGraph(5), [3, 1, 2, 3]);
    if (bad.valid) throw new Error('expected a violation');
    expect(bad.violation).toMatchObject({ label: 3, path: [0, 1, 2, 3, 4], edges: [0, 1, 2, 3] });
  });

  it('accepts the empty labelling of a graph without edges, and labels far above the edge count', () => {
    expect(verifyEdgeRanking(graphFromEdges(3, []), [])).toEqual({ valid: true, labelsUsed: 0, maxLabel: 0 });
    expect(verifyEdgeRanking(pathGraph(4), [1e9, 2e9, 1e9]).valid).toBe(true);
    expect(verifyEdgeRanking(pathGraph(4), [2e9, 1e9, 2e9]).valid).toBe(false);
  });

  it('treats labels that are not one whole number >= 1 per edge as a LabelError, not a verdict', () => {
    expect(() => verifyEdgeRanking(pathGraph(3), [1])).toThrow(LabelError);
    expect(() => verifyEdgeRanking(pathGraph(3), [1, 0])).toThrow(/edge 1/);
    expect(() => verifyEdgeRanking(pathGraph(3), [1, 1.5])).toThrow(LabelError);
    expect(() => verifyEdgeRanking(pathGraph(3), [Number.NaN, 1])).toThrow(LabelError);
  });
});
