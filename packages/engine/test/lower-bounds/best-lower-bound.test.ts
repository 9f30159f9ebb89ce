import { describe, expect, it } from 'vitest';
import { completeGraph, cycleGraph, graphFromEdges, gridGraph, maskGraph, pathGraph, randomGraph, seededRandom, starGraph } from '../../src/index';
import { bestLowerBound, checkLowerBoundWitness } from '../../src/bounds/lower/index';
import { bruteForceTreeDepth } from '../brute-force-td';
import { bruteRectangleTable } from './support';

describe('bestLowerBound', () => {
  it('is 0 with a trivial witness for the empty graph, at least 1 otherwise', () => {
    expect(bestLowerBound(graphFromEdges(0, []))).toEqual({ best: { value: 0, witness: { kind: 'trivial' }, argument: expect.any(String) }, all: [expect.anything()] });
    const one = bestLowerBound(graphFromEdges(1, []));
    expect(one.best.value).toBe(1);
    expect(one.all[0]).toMatchObject({ value: 1, witness: { kind: 'trivial' } });
  });

  it('is exact on paths, complete graphs and stars', () => {
    for (let n = 1; n <= 40; n++) expect(bestLowerBound(pathGraph(n)).best.value).toBe(Math.floor(Math.log2(n)) + 1);
    for (let n = 1; n <= 12; n++) expect(bestLowerBound(completeGraph(n)).best.value).toBe(n);
    expect(bestLowerBound(starGraph(7)).best.value).toBe(2);
  });

  it('runs every applicable bound, rectangle and staircase only for grid shapes', () => {
    const kinds = (g: Parameters<typeof bestLowerBound>[0]) => bestLowerBound(g).all.map((b) => b.witness.kind);
    expect(kinds(gridGraph(4, 6))).toEqual(['trivial', 'degeneracy', 'path', 'clique', 'minor-min-width', 'rectangle', 'staircase']);
    expect(kinds(cycleGraph(9))).toEqual(['trivial', 'degeneracy', 'path', 'clique', 'minor-min-width']);
    expect(kinds(graphFromEdges(24, [...gridGraph(4, 6).edges()].flat()))).not.toContain('rectangle'); // same graph, no layout
  });

  it('skips the expensive bounds above their vertex limits', () => {
    const g = randomGraph(400, 0.02, 3);
    const kinds = bestLowerBound(g, { mmwMaxVertices: 100, cliqueMaxVertices: 100 }).all.map((b) => b.witness.kind);
    expect(kinds).toEqual(['trivial', 'degeneracy', 'path']);
  });

  it('on small grids, with a brute-force table, reaches the true value where a block is known', () => {
    const knownRectangle = bruteRectangleTable(20);
    for (const [r, c] of [[2, 7], [3, 4], [4, 5]] as const) {
      const g = gridGraph(r, c);
      const { best } = bestLowerBound(g, { knownRectangle });
      expect(best.value, `${r}x${c}`).toBe(bruteForceTreeDepth(g));
      expect(checkLowerBoundWitness(g, best, { knownRectangle })).toEqual({ ok: true });
    }
  });

  it('on a 60 x 60 grid with random holes, every bound checks', () => {
    const rand = seededRandom(5);
    const present = Uint8Array.from({ length: 3600 }, () => (rand() < 0.9 ? 1 : 0));
    present[0] = 1;
    const g = maskGraph({ rows: 60, cols: 60, present });
    const { best, all } = bestLowerBound(g);
    for (const b of all) expect(checkLowerBoundWitness(g, b), b.witness.kind).toMatchObject({ ok: true });
    expect(best.value).toBeGreaterThanOrEqual(Math.floor(Math.log2(0.5 * g.vertexCount)) + 1);
  });
});
