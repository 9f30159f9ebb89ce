import { describe, expect, it } from 'vitest';
import {
  completeBipartiteGraph,
  completeGraph,
  componentIds,
  cycleGraph,
  cylinderGraph,
  EngineError,
  gridGraph,
  maskGraph,
  pathGraph,
  randomGraph,
  randomTree,
  SizeError,
  staircaseGraph,
  starGraph,
  torusGraph,
  treeFromParents,
  type Graph,
} from '../src/index';

/** Every edge must be stored both ways, sorted and without repeats: the Graph invariants. */
function expectWellFormed(g: Graph) {
  for (let v = 0; v < g.vertexCount; v++) {
    const run = Array.from(g.neighbours(v));
    expect(run).toEqual([...new Set(run)].sort((a, b) => a - b));
    expect(run).not.toContain(v);
    for (const w of run) expect(g.hasEdge(w, v)).toBe(true);
  }
}

describe('families', () => {
  // Vertex and edge counts of the lattices (common practice): the m x n grid P_m x P_n has mn vertices
  // and m(n - 1) + n(m - 1) = 2mn - m - n edges; the cylinder P_m x C_n adds one closing edge per row,
  // 2mn - n; the torus C_m x C_n closes both ways, 2mn (each vertex has degree 4, so 4mn / 2).
  it('give the grid, cylinder and torus their vertex and edge counts', () => {
    for (const [m, n] of [[1, 1], [1, 7], [2, 2], [3, 5], [4, 7], [6, 6], [9, 4]] as const) {
      const g = gridGraph(m, n);
      expect([g.vertexCount, g.edgeCount]).toEqual([m * n, 2 * m * n - m - n]);
      expectWellFormed(g);
    }
    for (const [m, n] of [[1, 3], [2, 5], [4, 6], [5, 3]] as const) {
      const g = cylinderGraph(m, n);
      expect([g.vertexCount, g.edgeCount]).toEqual([m * n, 2 * m * n - n]);
      expectWellFormed(g);
    }
    for (const [m, n] of [[3, 3], [4, 4], [3, 7], [6, 5]] as const) {
      const g = torusGraph(m, n);
      expect([g.vertexCount, g.edgeCount]).toEqual([m * n, 2 * m * n]);
      for (let v = 0; v < g.vertexCount; v++) expect(g.degree(v)).toBe(4);
      expectWellFormed(g);
    }
  });

  it('number grid vertices row-major and join the right cells', () => {
    const g = gridGraph(3, 4);
    expect(Array.from(g.neighbours(5))).toEqual([1, 4, 6, 9]); // cell (1,1)
    expect(g.family).toEqual({ kind: 'grid', rows: 3, cols: 4 });
    expect(Array.from(g.layout!.cells)).toEqual(Array.from({ length: 12 }, (_, i) => i));
    expect(cylinderGraph(2, 4).hasEdge(0, 3)).toBe(true);
    expect(torusGraph(3, 3).hasEdge(0, 6)).toBe(true);
  });

  // S(t) has 1 + 2 + ... + t = t(t + 1)/2 cells and t(t - 1) edges (derived beside staircaseGraph).
  it('give the staircase t(t + 1)/2 vertices and t(t - 1) edges', () => {
    for (let t = 1; t <= 12; t++) {
      const g = staircaseGraph(t);
      expect([g.vertexCount, g.edgeCount]).toEqual([(t * (t + 1)) / 2, t * (t - 1)]);
      expect(componentIds(g).count).toBe(1);
      expectWellFormed(g);
    }
    // Row-major numbering of present cells: S(3) is ### / ##. / #..
    expect(Array.from(staircaseGraph(3).layout!.cells)).toEqual([0, 1, 2, 3, 4, 6]);
  });

  it('number a mask\u2019s present cells row-major and join cells that share a side', () => {
    const present = Uint8Array.from([1, 1, 0, 1, 0, 1, 1, 1, 1]); // ##. / #.# / ###
    const g = maskGraph({ rows: 3, cols: 3, present });
    expect(g.vertexCount).toBe(7);
    expect(Array.from(g.layout!.cells)).toEqual([0, 1, 3, 5, 6, 7, 8]);
    expect([...g.edges()]).toEqual([[0, 1], [0, 2], [2, 4], [3, 6], [4, 5], [5, 6]]);
    expect(g.family).toMatchObject({ kind: 'mask', rows: 3, cols: 3, text: '##.\n#.#\n###\n' });
    expect(() => maskGraph({ rows: 1, cols: 2, present: Uint8Array.from([0, 0]) })).toThrow(/no cells/);
  });

  it('build the classic families with their counts', () => {
    expect([pathGraph(9).vertexCount, pathGraph(9).edgeCount]).toEqual([9, 8]);
    expect([cycleGraph(9).vertexCount, cycleGraph(9).edgeCount]).toEqual([9, 9]);
    expect(completeGraph(7).edgeCount).toBe(21);
    const k = completeBipartiteGraph(3, 4);
    expect([k.vertexCount, k.edgeCount, k.hasEdge(0, 1), k.hasEdge(0, 3)]).toEqual([7, 12, false, true]);
    const s = starGraph(8);
    expect([s.vertexCount, s.edgeCount, s.degree(0)]).toEqual([9, 8, 8]);
  });

  it('build a tree from a parent array and reject cycles and bad parents', () => {
    const t = treeFromParents([-1, 0, 0, 1, 1]);
    expect([...t.edges()]).toEqual([[0, 1], [0, 2], [1, 3], [1, 4]]);
    expect(() => treeFromParents([1, 2, 0])).toThrow(/cycle/);
    expect(() => treeFromParents([-1, 7])).toThrow(EngineError);
    expect(() => treeFromParents([0])).toThrow(/own parent/);
  });

  it('make seeded random trees that are trees, the same for the same seed', () => {
    for (const n of [1, 2, 3, 10, 500]) {
      const t = randomTree(n, 42);
      expect(t.edgeCount).toBe(n - 1);
      expect(componentIds(t).count).toBe(1);
    }
    expect([...randomTree(60, 7).edges()]).toEqual([...randomTree(60, 7).edges()]);
    expect([...randomTree(60, 7).edges()]).not.toEqual([...randomTree(60, 8).edges()]);
  });

  it('make seeded G(n, p) with about p * n(n - 1)/2 edges', () => {
    const g = randomGraph(400, 0.05, 3);
    const expected = (0.05 * 400 * 399) / 2;
    // The edge count is binomial; 5 standard deviations either side (common practice for a seeded check).
    expect(Math.abs(g.edgeCount - expected)).toBeLessThan(5 * Math.sqrt(expected * 0.95));
    expectWellFormed(g);
    expect(randomGraph(30, 0, 1).edgeCount).toBe(0);
    expect(randomGraph(30, 1, 1).edgeCount).toBe(435);
    expect([...randomGraph(50, 0.2, 9).edges()]).toEqual([...randomGraph(50, 0.2, 9).edges()]);
  });

  it('refuse zero, negative, fractional and oversized sizes with a SizeError', () => {
    expect(() => gridGraph(0, 4)).toThrow(SizeError);
    expect(() => gridGraph(-2, 4)).toThrow(/rows must be a whole number >= 1/);
    expect(() => gridGraph(2.5, 4)).toThrow(SizeError);
    expect(() => gridGraph(100_000, 100_000)).toThrow(/at most 10000000/);
    expect(() => cycleGraph(2)).toThrow(/>= 3/);
    expect(() => torusGraph(2, 5)).toThrow(SizeError);
    expect(() => completeGraph(20_000)).toThrow(/edges/);
  });
});
