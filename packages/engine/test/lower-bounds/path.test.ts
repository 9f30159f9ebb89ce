import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { completeGraph, cycleGraph, graphFromEdges, gridGraph, pathGraph, randomTree, starGraph } from '../../src/index';
import { checkLowerBoundWitness, longPathBound } from '../../src/bounds/lower/index';
import { arbitrarySmallGraph, maskFrom } from './support';

const log2 = (n: number) => Math.floor(Math.log2(n));

describe('longPathBound', () => {
  it('gives ⌊log2 n⌋ + 1 on the path P_n (Bodlaender et al., SIAM J. Discrete Math. 1998)', () => {
    for (let n = 1; n <= 130; n++) {
      const g = pathGraph(n);
      const b = longPathBound(g);
      expect(b.value, `P_${n}`).toBe(log2(n) + 1);
      expect(checkLowerBoundWitness(g, b)).toEqual({ ok: true });
    }
    expect(longPathBound(pathGraph(100_000)).value).toBe(17);
  });

  it('finds a Hamiltonian-length path where one exists: K_n, C_n, grids', () => {
    for (let n = 1; n <= 12; n++) expect(longPathBound(completeGraph(n)).value).toBe(log2(n) + 1);
    for (let n = 3; n <= 70; n++) expect(longPathBound(cycleGraph(n)).value).toBe(log2(n) + 1);
    for (const [r, c] of [[3, 3], [5, 7], [20, 20], [64, 64]] as const) expect(longPathBound(gridGraph(r, c)).value, `${r}x${c}`).toBe(log2(r * c) + 1);
  });

  it('stays in one component and on edges: a star gives a path of 3 vertices (value 2)', () => {
    const b = longPathBound(starGraph(9));
    expect(b.value).toBe(2);
    expect(b.witness).toMatchObject({ kind: 'path' });
    const two = graphFromEdges(7, [0, 1, 1, 2, 3, 4, 4, 5, 5, 6]); // P_3 and P_4
    expect(longPathBound(two).value).toBe(3);
    expect(longPathBound(graphFromEdges(4, [])).value).toBe(1);
  });

  it('looks beyond the first largest component: a star and a path of the same size, and many components', () => {
    // K_{1,3} on 0..3 (longest path 3) before P_4 on 4..7 (longest path 4).
    const g = graphFromEdges(8, [0, 1, 0, 2, 0, 3, 4, 5, 5, 6, 6, 7]);
    expect(longPathBound(g)).toMatchObject({ value: 3, witness: { kind: 'path', vertices: expect.arrayContaining([4, 5, 6, 7]) } });
    // Paths of 3, 5, 2, 9 and 4 vertices, one after another; 500 isolated vertices after them.
    const pairs: number[] = [];
    let first = 0;
    for (const size of [3, 5, 2, 9, 4]) {
      for (let i = 0; i + 1 < size; i++) pairs.push(first + i, first + i + 1);
      first += size;
    }
    const many = graphFromEdges(first + 500, pairs);
    const b = longPathBound(many);
    expect(b.value).toBe(log2(9) + 1);
    expect(checkLowerBoundWitness(many, b)).toEqual({ ok: true });
  });

  it('is exhaustive on small graphs: matches a brute-force longest path (n <= 9)', () => {
    const longest = (n: number, adj: Set<number>[]): number => {
      let best = 0;
      const seen = new Set<number>();
      const go = (v: number, len: number) => {
        best = Math.max(best, len);
        for (const w of adj[v]!) {
          if (seen.has(w)) continue;
          seen.add(w);
          go(w, len + 1);
          seen.delete(w);
        }
      };
      for (let s = 0; s < n; s++) {
        seen.add(s);
        go(s, 1);
        seen.delete(s);
      }
      return best;
    };
    fc.assert(
      fc.property(arbitrarySmallGraph(9), (g) => {
        const adj = Array.from({ length: g.vertexCount }, (_, v) => new Set(g.neighbours(v)));
        const b = longPathBound(g);
        expect(checkLowerBoundWitness(g, b)).toEqual({ ok: true });
        // Only ⌊log2 k⌋ counts, so the bound must match the longest path's value, not its length.
        expect(b.value).toBe(log2(longest(g.vertexCount, adj)) + 1);
      }),
      { numRuns: 1000 },
    );
  });

  it('is deterministic and stops at its budget with a valid path', () => {
    fc.assert(
      fc.property(arbitrarySmallGraph(14), fc.integer({ min: 1, max: 50 }), (g, budget) => {
        expect(longPathBound(g)).toEqual(longPathBound(g));
        const capped = longPathBound(g, { budget, starts: 1 });
        expect(checkLowerBoundWitness(g, capped)).toEqual({ ok: true });
      }),
      { numRuns: 1000 },
    );
    const t = randomTree(5000, 3);
    expect(longPathBound(t)).toEqual(longPathBound(t));
  });

  it('threads a grid with holes', () => {
    const g = maskFrom('#####', '#.#.#', '#####', '.#.#.', '#####');
    const b = longPathBound(g);
    expect(checkLowerBoundWitness(g, b)).toEqual({ ok: true });
    // 20 cells; (2,0) (1,0), row 0, (1,4), row 2 back to (2,1), (3,1), row 4 from (4,1) is a path of 17.
    expect(b.value).toBe(log2(17) + 1);
  });
});
