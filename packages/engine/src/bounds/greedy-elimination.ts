import type { Graph } from '../graph/graph';
import { rankingFromOrder } from './elimination-ranking';
import { boundOfRanking, type UpperBound } from './upper-bound';

/**
 * Greedy elimination: eliminate vertices of small degree first (a minimum-degree ordering on the original
 * graph, by bucket sort), so that well-connected vertices end up near the roots of the elimination forest,
 * and read the ranking from that forest. Fast on any graph; the fallback when dissection does poorly.
 */
export function greedyEliminationRanking(g: Graph): UpperBound {
  const n = g.vertexCount;
  let maxDegree = 0;
  for (let v = 0; v < n; v++) maxDegree = Math.max(maxDegree, g.degree(v));
  const start = new Uint32Array(maxDegree + 2);
  for (let v = 0; v < n; v++) start[g.degree(v) + 1]!++;
  for (let d = 1; d <= maxDegree + 1; d++) start[d]! += start[d - 1]!;
  const order = new Uint32Array(n);
  for (let v = 0; v < n; v++) order[start[g.degree(v)]!++] = v;
  return boundOfRanking(
    rankingFromOrder(g, order),
    'greedy-elimination',
    (value) => `eliminate vertices of smallest degree first and label by height in the elimination forest (${value} labels)`,
  );
}
