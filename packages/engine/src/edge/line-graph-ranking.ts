import type { UpperBound } from '../bounds/upper-bound';
import type { Graph } from '../graph/graph';
import { lineGraph } from './line-graph';
import { separatorRanking } from './separator-ranking';
import { verifyEdgeRanking } from './verify-edge-ranking';

/**
 * An edge ranking of any graph through its line graph: an edge ranking of G is exactly a vertex ranking
 * of L(G) (a path of G between two edges is a path of L(G) between two vertices, and back), so
 * χ'r(G) = td(L(G)). L(G) is ranked by nested dissection (separator-ranking.ts), a heuristic: the value
 * is an upper bound, exact on some families (paths, stars) but not in general. labels[i] labels edge i
 * of `g.edges()`. Throws a SizeError when L(G) is too large to build.
 */
export function edgeRankingByLineGraph(g: Graph): UpperBound {
  const line = lineGraph(g).graph;
  const labels = separatorRanking(line);
  const verdict = verifyEdgeRanking(g, labels);
  if (!verdict.valid) throw new Error('edgeRankingByLineGraph: nested dissection produced a labelling that is not an edge ranking');
  const value = verdict.maxLabel;
  return {
    value,
    labels,
    construction: 'line-graph',
    argument: `a vertex ranking of the line graph L(G) (${line.vertexCount} vertices, ${line.edgeCount} edges) by nested dissection with breadth-first level separators; an edge ranking of G is a vertex ranking of L(G), so G's ${g.edgeCount} edges need at most ${value} labels`,
  };
}
