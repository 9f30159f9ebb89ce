import { describe, expect, it } from 'vitest';
import { Bitset, gridGraph, maskGraph, randomGraph, seededRandom, type Graph } from '../src/index';
import { CutVertices } from '../src/exact/cut-vertices';

// The definition, checked directly: v is a cut vertex of a connected set S when S - v has two or more
// components (common practice), counted here by a plain breadth-first search.
function componentsOf(g: Graph, set: Set<number>): number {
  const seen = new Set<number>();
  let count = 0;
  for (const s of set) {
    if (seen.has(s)) continue;
    count++;
    const queue = [s];
    seen.add(s);
    while (queue.length) {
      const v = queue.pop()!;
      for (const u of g.neighbours(v)) if (set.has(u) && !seen.has(u)) (seen.add(u), queue.push(u));
    }
  }
  return count;
}

function checkAllSubsets(g: Graph, members: number[]) {
  const set = new Set(members);
  if (members.length === 0 || componentsOf(g, set) !== 1) return;
  const found = new CutVertices(g.offsets, g.targets).find(Bitset.of(g.vertexCount, members), members[0]!, new Bitset(g.vertexCount));
  for (const v of members) {
    const without = new Set(members.filter((u) => u !== v));
    expect(found.has(v), `vertex ${v} of {${members.join(',')}}`).toBe(componentsOf(g, without) > 1);
  }
}

describe('cut vertices of a connected vertex set (Hopcroft & Tarjan 1973)', () => {
  it('match the definition on random connected subsets of grids and masks', () => {
    const rand = seededRandom(7);
    for (let trial = 0; trial < 300; trial++) {
      const rows = 2 + Math.floor(rand() * 5);
      const cols = 2 + Math.floor(rand() * 6);
      const present = Uint8Array.from({ length: rows * cols }, () => (rand() < 0.75 ? 1 : 0));
      const g = trial % 3 === 0 ? gridGraph(rows, cols) : maskGraph({ rows, cols, present });
      const members = Array.from({ length: g.vertexCount }, (_, v) => v).filter(() => rand() < 0.8);
      checkAllSubsets(g, members);
    }
  });

  it('match the definition on random graphs, whole and in part', () => {
    for (let seed = 1; seed <= 60; seed++) {
      const g = randomGraph(12 + (seed % 9), 0.25, seed);
      checkAllSubsets(g, Array.from({ length: g.vertexCount }, (_, v) => v));
      checkAllSubsets(g, Array.from({ length: g.vertexCount }, (_, v) => v).filter((v) => v % 4 !== seed % 4));
    }
  });

  it('a path has its inner vertices as cut vertices, a 2 x 3 ladder none', () => {
    const path = gridGraph(1, 6);
    const all = [0, 1, 2, 3, 4, 5];
    const cuts = new CutVertices(path.offsets, path.targets).find(Bitset.of(6, all), 3, new Bitset(6));
    expect(all.filter((v) => cuts.has(v))).toEqual([1, 2, 3, 4]);
    const ladder = gridGraph(2, 3); // two-connected: no vertex splits it
    const none = new CutVertices(ladder.offsets, ladder.targets).find(Bitset.of(6, all), 0, new Bitset(6));
    expect(all.filter((v) => none.has(v))).toEqual([]);
  });
});
