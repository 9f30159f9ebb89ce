import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { graphFromEdges, maskGraph, pathGraph, type Graph } from '../../src/index';
import { bestLowerBound, checkLowerBoundWitness, graphWithoutVertex, vertexRemovedBound } from '../../src/bounds/lower/index';
import { bruteForceTreeDepth } from '../brute-force-td';
import { arbitrarySmallGraph } from './support';

/** G − v written out from the edge list, independently of graphWithoutVertex. */
function removeByEdges(g: Graph, v: number): Graph {
  const pairs: number[] = [];
  for (const [a, b] of g.edges()) if (a !== v && b !== v) pairs.push(a > v ? a - 1 : a, b > v ? b - 1 : b);
  return graphFromEdges(g.vertexCount - 1, pairs);
}

describe('vertexRemovedBound', () => {
  it('td(G − v) <= td(G) <= td(G − v) + 1, so the bound is td(G − v) itself (brute force, n <= 12)', () => {
    fc.assert(
      fc.property(arbitrarySmallGraph(12), fc.nat(), (g, pick) => {
        const v = pick % g.vertexCount;
        const td = bruteForceTreeDepth(g);
        const rest = graphWithoutVertex(g, v);
        const tdRest = bruteForceTreeDepth(rest);
        // Monotone under subgraphs (Nešetřil & Ossona de Mendez, Sparsity, 2012): a lower bound for G.
        expect(tdRest).toBeLessThanOrEqual(td);
        // One more label for v on top of G − v: an upper bound for G, the other direction.
        expect(td).toBeLessThanOrEqual(tdRest + 1);
        const b = vertexRemovedBound(v, tdRest, 'brute force on G − v');
        expect(b.value).toBe(tdRest);
        expect(b.value).toBeLessThanOrEqual(td);
        expect(checkLowerBoundWitness(g, b)).toMatchObject({ ok: true, assumes: expect.stringContaining('brute force') });
      }),
      { numRuns: 1000 },
    );
  });

  it('is sometimes tight and sometimes one short (paths, χr(P_n) = ⌊log2 n⌋ + 1, Bodlaender et al. 1998)', () => {
    // P_5 − an end = P_4: 3 and 3, tight. P_4 − an end = P_3: 3 and 2, one short.
    expect(vertexRemovedBound(0, bruteForceTreeDepth(graphWithoutVertex(pathGraph(5), 0)), 'brute force').value).toBe(bruteForceTreeDepth(pathGraph(5)));
    expect(vertexRemovedBound(0, bruteForceTreeDepth(graphWithoutVertex(pathGraph(4), 0)), 'brute force').value).toBe(bruteForceTreeDepth(pathGraph(4)) - 1);
  });

  it('enters bestLowerBound through `extra`', () => {
    const g = graphFromEdges(6, [0, 1, 1, 2, 2, 3, 3, 4, 4, 5, 5, 0]);
    const b = vertexRemovedBound(0, 3, 'χr(P_5) = 3, Bodlaender et al. 1998');
    expect(bestLowerBound(g, { extra: [b] }).all).toContain(b);
  });

  it('rejects what is no vertex or no rank number', () => {
    expect(() => vertexRemovedBound(-1, 2, 'x')).toThrow();
    expect(() => vertexRemovedBound(0, 1.5, 'x')).toThrow();
    const g = graphFromEdges(3, [0, 1]);
    expect(checkLowerBoundWitness(g, vertexRemovedBound(5, 1, 'x'))).toMatchObject({ ok: false });
    expect(checkLowerBoundWitness(g, vertexRemovedBound(0, 3, 'x'))).toMatchObject({ ok: false }); // G − 0 has 2 vertices
  });
});

describe('graphWithoutVertex', () => {
  it('matches G − v built from the edge list, and keeps the layout of the other cells', () => {
    fc.assert(
      fc.property(arbitrarySmallGraph(14), fc.nat(), (g, pick) => {
        const v = pick % g.vertexCount;
        const rest = graphWithoutVertex(g, v);
        const expected = removeByEdges(g, v);
        expect(rest.vertexCount).toBe(expected.vertexCount);
        expect([...rest.edges()]).toEqual([...expected.edges()]);
      }),
      { numRuns: 1000 },
    );
    const g = maskGraph({ rows: 2, cols: 2, present: Uint8Array.from([1, 1, 1, 1]) });
    expect(Array.from(graphWithoutVertex(g, 1).layout!.cells)).toEqual([0, 2, 3]);
  });
});
