import { edgeRankingByLineGraph, gridGraph, optimalTreeEdgeRanking, randomTree } from '@cairn/engine';
import { runCases } from '../harness';

/** Targets: the optimal tree edge ranking of a 10^6-vertex random tree <= 500 ms; the line-graph heuristic on the 100 x 100 grid is timed only. */
export function edgeSuite(maxTime: number) {
  const tree = randomTree(1_000_000, 11);
  const grid = gridGraph(100, 100);
  return runCases(
    {
      'optimalTreeEdgeRanking random tree 10^6': { targetMs: 500, run: () => void optimalTreeEdgeRanking(tree) },
      'edgeRankingByLineGraph grid 100x100': () => void edgeRankingByLineGraph(grid),
    },
    maxTime,
  );
}
