import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { edgeRankingByLineGraph, lineGraph, optimalTreeEdgeRanking, separatorRanking, verifyEdgeRanking } from '../../src/edge/index';
import { completeGraph, cycleGraph, graphFromEdges, gridGraph, pathGraph, randomGraph, randomTree, starGraph, verifyRanking } from '../../src/index';
import { bruteForceTreeDepth } from '../brute-force-td';
import { arbitraryGraph, toGraph } from '../support';

describe('separatorRanking', () => {
  it('is a vertex ranking of 1500 random graphs, never below the brute-force tree-depth (fast-check)', () => {
    fc.assert(
      fc.property(arbitraryGraph(11), (data) => {
        const g = toGraph(data);
        const labels = separatorRanking(g);
        const verdict = verifyRanking(g, labels);
        expect(verdict.valid).toBe(true);
        expect(verdict.maxLabel).toBeGreaterThanOrEqual(bruteForceTreeDepth(g));
      }),
      { numRuns: 1500 },
    );
  });

  it('is optimal on paths and cliques: floor(log2 n) + 1 (Bodlaender et al., SIAM J. Discrete Math. 1998) and n (common practice)', () => {
    for (let n = 1; n <= 200; n++) expect(Math.max(...separatorRanking(pathGraph(n)))).toBe(Math.floor(Math.log2(n)) + 1);
    for (let n = 1; n <= 12; n++) expect(Math.max(...separatorRanking(completeGraph(n)))).toBe(n);
  });
});

describe('edgeRankingByLineGraph', () => {
  it('passes the edge-ranking verifier on 1000 random graphs (fast-check)', () => {
    fc.assert(
      fc.property(arbitraryGraph(10), (data) => {
        const g = toGraph(data);
        const bound = edgeRankingByLineGraph(g);
        expect(bound.construction).toBe('line-graph');
        expect(bound.labels).toHaveLength(g.edgeCount);
        expect(verifyEdgeRanking(g, bound.labels)).toMatchObject({ valid: true, maxLabel: bound.value });
      }),
      { numRuns: 1000 },
    );
  });

  it('passes the verifier on grids, cycles, sparse random graphs and trees, never below the optimum on trees', () => {
    for (const [rows, cols] of [
      [1, 1],
      [1, 7],
      [2, 2],
      [3, 5],
      [8, 8],
      [20, 30],
    ] as const) {
      const g = gridGraph(rows, cols);
      const bound = edgeRankingByLineGraph(g);
      expect(verifyEdgeRanking(g, bound.labels).valid, `${rows}x${cols}`).toBe(true);
    }
    for (const g of [cycleGraph(17), randomGraph(300, 0.02, 5), randomGraph(60, 0.3, 6)]) expect(verifyEdgeRanking(g, edgeRankingByLineGraph(g).labels).valid).toBe(true);
    for (let seed = 1; seed <= 40; seed++) {
      const tree = randomTree(10 + seed * 5, seed);
      const bound = edgeRankingByLineGraph(tree);
      expect(verifyEdgeRanking(tree, bound.labels).valid).toBe(true);
      expect(bound.value).toBeGreaterThanOrEqual(Math.max(...optimalTreeEdgeRanking(tree)));
    }
  });

  it('meets the known values on paths and stars, and the brute force on small grids it cannot beat', () => {
    for (let n = 2; n <= 100; n++) expect(edgeRankingByLineGraph(pathGraph(n)).value).toBe(Math.floor(Math.log2(n - 1)) + 1); // L(P_n) = P_(n-1)
    for (let leaves = 1; leaves <= 30; leaves++) expect(edgeRankingByLineGraph(starGraph(leaves)).value).toBe(leaves); // L = K_n
    for (const [rows, cols] of [
      [2, 3],
      [3, 3],
      [3, 4],
    ] as const) {
      const g = gridGraph(rows, cols);
      expect(edgeRankingByLineGraph(g).value).toBeGreaterThanOrEqual(bruteForceTreeDepth(lineGraph(g).graph));
    }
  });

  it('labels nothing in a graph without edges', () => {
    expect(edgeRankingByLineGraph(graphFromEdges(4, []))).toMatchObject({ value: 0, labels: new Int32Array(0) });
  });
});
