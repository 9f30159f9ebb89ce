import fc from 'fast-check';
import Graphology from 'graphology';
import { connectedComponents } from 'graphology-components';
import { describe, expect, it } from 'vitest';
import { Bitset, componentIds, componentsOf, gridGraph } from '../src/index';
import { arbitraryGraph, toGraph } from './support';

/** Components as sorted lists of vertex numbers, in a canonical order, for comparing two answers. */
const canonical = (parts: number[][]) => parts.map((p) => [...p].sort((a, b) => a - b)).sort((a, b) => a[0]! - b[0]!);

describe('components of an induced subset', () => {
  it('agree with graphology-components (a general-purpose graph library from npm) on 1000 random graphs and subsets', () => {
    fc.assert(
      fc.property(
        arbitraryGraph(30).chain(([n, pairs]) => fc.tuple(fc.constant(n), fc.constant(pairs), fc.array(fc.boolean(), { minLength: n, maxLength: n }))),
        ([n, pairs, keep]) => {
          const g = toGraph([n, pairs]);
          const subset = Bitset.of(n, keep.flatMap((k, v) => (k ? [v] : [])));
          const reference = new Graphology({ type: 'undirected', multi: false, allowSelfLoops: true });
          subset.forEach((v) => reference.addNode(String(v)));
          for (const [u, v] of pairs) {
            if (subset.has(u) && subset.has(v) && u !== v && !reference.hasEdge(String(u), String(v))) reference.addEdge(String(u), String(v));
          }
          const expected = canonical(connectedComponents(reference).map((c) => c.map(Number)));
          expect(canonical(componentsOf(g, subset).map((c) => c.toArray()))).toEqual(expected);
          const { ids, count } = componentIds(g, subset);
          expect(count).toBe(expected.length);
          const grouped = new Map<number, number[]>();
          ids.forEach((id, v) => id >= 0 && grouped.set(id, [...(grouped.get(id) ?? []), v]));
          expect(canonical([...grouped.values()])).toEqual(expected);
        },
      ),
      { numRuns: 1000 },
    );
  });

  it('splits a grid along a removed column', () => {
    const g = gridGraph(3, 5);
    const subset = Bitset.full(15);
    for (let r = 0; r < 3; r++) subset.delete(r * 5 + 2);
    const parts = componentsOf(g, subset);
    expect(parts.map((p) => p.popcount())).toEqual([6, 6]);
    expect(componentIds(g).count).toBe(1);
  });
});
