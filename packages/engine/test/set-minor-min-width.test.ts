import { describe, expect, it } from 'vitest';
import { Bitset, completeGraph, cycleGraph, graphFromEdges, gridGraph, minorMinWidthBound, randomGraph, seededRandom, type Graph } from '../src/index';
import { SetMinorMinWidth } from '../src/exact/set-minor-min-width';
import { bruteForceTreeDepth } from './brute-force-td';

/** The subgraph induced by `members`, renumbered 0 .. k - 1. */
function induced(g: Graph, members: number[]): Graph {
  const index = new Map(members.map((v, i) => [v, i]));
  const edges: number[] = [];
  for (const v of members) for (const u of g.neighbours(v)) if (u > v && index.has(u)) edges.push(index.get(v)!, index.get(u)!);
  return graphFromEdges(members.length, edges);
}

const adjacency = (g: Graph) => Array.from({ length: g.vertexCount }, (_, v) => Bitset.of(g.vertexCount, g.neighbours(v)));

describe('minor-min-width of a vertex set (Gogate & Dechter 2004), as the search uses it', () => {
  it('gives K_n its n, a cycle 3 and a grid of side >= 2 at least 3 (minimum degrees of minors, common practice)', () => {
    for (let n = 1; n <= 8; n++) {
      const g = completeGraph(n);
      expect(new SetMinorMinWidth(n, adjacency(g)).bound(Bitset.full(n))).toBe(n);
    }
    const c = cycleGraph(9);
    expect(new SetMinorMinWidth(9, adjacency(c)).bound(Bitset.full(9))).toBe(3);
    const grid = gridGraph(4, 5);
    expect(new SetMinorMinWidth(20, adjacency(grid)).bound(Bitset.full(20))).toBeGreaterThanOrEqual(3);
  });

  it('equals the whole-graph minor-min-width on whole random graphs and never exceeds the brute-force tree-depth of a subset', () => {
    const rand = seededRandom(11);
    for (let seed = 1; seed <= 40; seed++) {
      const g = randomGraph(10 + (seed % 5), 0.2 + 0.4 * rand(), seed);
      const n = g.vertexCount;
      const mmw = new SetMinorMinWidth(n, adjacency(g));
      expect(mmw.bound(Bitset.full(n)), `seed ${seed}`).toBe(minorMinWidthBound(g).value);
      const members = Array.from({ length: n }, (_, v) => v).filter(() => rand() < 0.7);
      if (members.length === 0) continue;
      const sub = Bitset.of(n, members);
      expect(mmw.bound(sub), `seed ${seed} subset`).toBeLessThanOrEqual(bruteForceTreeDepth(induced(g, members)));
    }
  });
});
