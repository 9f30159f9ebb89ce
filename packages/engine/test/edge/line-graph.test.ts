import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lineGraph, lineGraphEdgeCount } from '../../src/edge/index';
import { completeGraph, cycleGraph, gridGraph, pathGraph, SizeError, starGraph } from '../../src/index';
import { arbitraryGraph, toGraph } from '../support';

describe('lineGraph', () => {
  it('has one vertex per edge and sum of deg(v)(deg(v) - 1)/2 edges, adjacency exactly where edges meet (2000 random graphs, fast-check)', () => {
    fc.assert(
      fc.property(arbitraryGraph(10), (data) => {
        const g = toGraph(data);
        const { graph: line, edges } = lineGraph(g);
        const list = [...g.edges()];
        expect(edges).toEqual(list);
        expect(line.vertexCount).toBe(g.edgeCount);
        let expected = 0;
        for (let v = 0; v < g.vertexCount; v++) expected += (g.degree(v) * (g.degree(v) - 1)) / 2; // common practice
        expect(line.edgeCount).toBe(expected);
        expect(lineGraphEdgeCount(g)).toBe(expected);
        for (let i = 0; i < list.length; i++) {
          const run = [...line.neighbours(i)];
          expect(run).toEqual([...run].sort((a, b) => a - b));
          for (let j = 0; j < list.length; j++) {
            const [a, b] = list[i]!;
            const [c, d] = list[j]!;
            const meet = i !== j && (a === c || a === d || b === c || b === d);
            expect(line.hasEdge(i, j)).toBe(meet);
          }
        }
      }),
      { numRuns: 2000 },
    );
  });

  it('turns P_n into P_(n-1), C_n into C_n and K_(1,n) into K_n (common practice)', () => {
    const path = lineGraph(pathGraph(9)).graph;
    expect([...path.edges()]).toEqual(Array.from({ length: 7 }, (_, i) => [i, i + 1]));
    const cycle = lineGraph(cycleGraph(6)).graph;
    expect(cycle.vertexCount).toBe(6);
    expect(cycle.edgeCount).toBe(6);
    for (let v = 0; v < 6; v++) expect(cycle.degree(v)).toBe(2);
    const star = lineGraph(starGraph(7)).graph;
    expect(star.edgeCount).toBe(21);
  });

  it('gives the grid its line graph: 2rc - r - c vertices, and K_4 its 12-edge octahedron (common practice)', () => {
    const line = lineGraph(gridGraph(3, 4)).graph;
    expect(line.vertexCount).toBe(2 * 3 * 4 - 3 - 4);
    const octahedron = lineGraph(completeGraph(4)).graph;
    expect(octahedron.vertexCount).toBe(6);
    expect(octahedron.edgeCount).toBe(12);
    for (let v = 0; v < 6; v++) expect(octahedron.degree(v)).toBe(4);
  });

  it('refuses, with a SizeError saying why, a line graph with more edges than a graph may hold', () => {
    // A star with 15 000 leaves: its line graph K_15000 has 112 492 500 edges.
    expect(() => lineGraph(starGraph(15_000))).toThrow(SizeError);
    expect(() => lineGraph(starGraph(15_000))).toThrow(/deg\(v\)\(deg\(v\) - 1\)\/2/);
  });
});
