import { describe, expect, it } from 'vitest';
import { edgeRankingByLineGraph, lineGraph, optimalTreeEdgeRanking, verifyEdgeRanking } from '../../src/edge/index';
import { optimalTreeEdgeRankingWide } from '../../src/edge/tree-edge-ranking';
import { cycleGraph, EngineError, graphFromEdges, pathGraph, randomTree, seededRandom, starGraph, treeFromParents, type Graph } from '../../src/index';
import { distinctTrees } from '../all-trees';
import { bruteForceTreeDepth } from '../brute-force-td';


const maxOf = (labels: Int32Array) => labels.reduce((a, b) => Math.max(a, b), 0);

/** The optimal ranking is an edge ranking and uses exactly td(L(tree)) labels (brute force). */
function expectOptimal(tree: Graph, what: string) {
  const labels = optimalTreeEdgeRanking(tree);
  expect(verifyEdgeRanking(tree, labels).valid, what).toBe(true);
  expect(maxOf(labels), what).toBe(bruteForceTreeDepth(lineGraph(tree).graph));
}

describe('optimalTreeEdgeRanking', () => {
  it('equals a brute-force tree-depth of the line graph on every tree with up to 10 vertices', () => {
    let checked = 0;
    for (const parent of distinctTrees(10)) {
      expectOptimal(treeFromParents(parent), parent.join());
      checked++;
    }
    // The numbers of unlabelled trees on 1..10 vertices (OEIS A000055) add up to 201.
    expect(checked).toBe(201);
  });

  it('equals the brute force on 300 random trees of up to 20 vertices', () => {
    for (let seed = 1; seed <= 300; seed++) expectOptimal(randomTree(2 + (seed % 19), seed), `seed ${seed}`);
  });

  it('equals the brute force on 300 bushy random trees of up to 21 vertices (brooms, spiders, stars of stars)', () => {
    // Parents drawn from the first few vertices give high degrees, where children's sets interact most.
    const rand = seededRandom(2024);
    for (let run = 0; run < 300; run++) {
      const n = 6 + (run % 16);
      const reach = 1 + (run % 5);
      const parent = Array.from({ length: n }, (_, v) => (v === 0 ? -1 : Math.floor(rand() * Math.min(v, reach + Math.floor(rand() * v)))));
      expectOptimal(treeFromParents(parent), parent.join());
    }
  });

  it('gives P_n floor(log2(n - 1)) + 1 labels: L(P_n) = P_(n-1) (Bodlaender et al., "Rankings of graphs", SIAM J. Discrete Math. 1998)', () => {
    for (let n = 2; n <= 300; n++) expect(maxOf(optimalTreeEdgeRanking(pathGraph(n))), `P_${n}`).toBe(Math.floor(Math.log2(n - 1)) + 1);
    for (const n of [1025, 65_537, 1_000_000]) expect(maxOf(optimalTreeEdgeRanking(pathGraph(n)))).toBe(Math.floor(Math.log2(n - 1)) + 1);
    expect(optimalTreeEdgeRanking(pathGraph(1))).toHaveLength(0);
  });

  it('gives the star K_(1,n) n labels: its edges pairwise meet, L = K_n (common practice), past 53 labels too', () => {
    for (let leaves = 1; leaves <= 80; leaves++) {
      const labels = optimalTreeEdgeRanking(starGraph(leaves));
      expect(maxOf(labels)).toBe(leaves);
      expect(new Set(labels).size).toBe(leaves);
    }
    expect(maxOf(optimalTreeEdgeRanking(starGraph(3000)))).toBe(3000);
  });

  it('takes the bigint path beyond 53 labels and agrees with the double path below', () => {
    // A star of 60 paths of length 2: the centre needs 60 labels, its subtrees' sets are all {1}.
    const parent = [-1, ...Array.from({ length: 120 }, (_, i) => (i < 60 ? 0 : i - 59))];
    const spider = treeFromParents(parent);
    const labels = optimalTreeEdgeRanking(spider);
    expect(verifyEdgeRanking(spider, labels).valid).toBe(true);
    expect(maxOf(labels)).toBe(61); // the 60 legs' edges at the centre must all differ, and all exceed a leg's 1
    for (let seed = 1; seed <= 100; seed++) {
      const tree = randomTree(2 + seed * 7, seed);
      expect(optimalTreeEdgeRankingWide(tree)).toEqual(optimalTreeEdgeRanking(tree));
    }
    for (let n = 2; n <= 12; n++) {
      const tree = randomTree(n, n);
      expect(maxOf(optimalTreeEdgeRankingWide(tree))).toBe(bruteForceTreeDepth(lineGraph(tree).graph));
    }
  });

  it('ranks large random trees validly, between the largest degree and the line-graph heuristic', () => {
    for (const [n, seed] of [
      [2000, 1],
      [20_000, 2],
      [100_000, 3],
    ] as const) {
      const tree = randomTree(n, seed);
      const labels = optimalTreeEdgeRanking(tree);
      expect(verifyEdgeRanking(tree, labels).valid).toBe(true);
      let maxDegree = 0;
      for (let v = 0; v < n; v++) maxDegree = Math.max(maxDegree, tree.degree(v));
      expect(maxOf(labels)).toBeGreaterThanOrEqual(maxDegree); // the edges at a vertex pairwise meet
      if (n <= 20_000) expect(maxOf(labels)).toBeLessThanOrEqual(edgeRankingByLineGraph(tree).value);
    }
  });

  it('ranks forests tree by tree and refuses graphs with a cycle', () => {
    const forest = graphFromEdges(9, [0, 1, 1, 2, 2, 3, 5, 6, 5, 7, 5, 8]);
    const labels = optimalTreeEdgeRanking(forest);
    expect(verifyEdgeRanking(forest, labels).valid).toBe(true);
    expect(maxOf(labels)).toBe(3); // P_4 needs 2, the star K_(1,3) needs 3
    expect(optimalTreeEdgeRanking(graphFromEdges(4, []))).toHaveLength(0);
    expect(optimalTreeEdgeRanking(graphFromEdges(0, []))).toHaveLength(0);
    expect(() => optimalTreeEdgeRanking(cycleGraph(5))).toThrow(EngineError);
    expect(() => optimalTreeEdgeRanking(graphFromEdges(5, [0, 1, 1, 2, 2, 0]))).toThrow(/cycle/);
  });
});
