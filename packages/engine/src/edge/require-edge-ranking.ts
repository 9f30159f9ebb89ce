import { LabelError } from '../errors';
import type { Graph } from '../graph/graph';
import { verifyEdgeRanking } from './verify-edge-ranking';

/** Throws a LabelError naming the offending path unless edgeLabels is an edge ranking of g. */
export function requireEdgeRanking(g: Graph, edgeLabels: ArrayLike<number>, what: string): void {
  const verdict = verifyEdgeRanking(g, edgeLabels);
  if (!verdict.valid) {
    const { label, e, f, path } = verdict.violation;
    throw new LabelError(`${what} needs an edge ranking: edges ${e} and ${f} both have label ${label} and the path ${path.join('-')} has no larger label between them`);
  }
}
