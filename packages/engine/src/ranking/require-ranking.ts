import { LabelError } from '../errors';
import type { Graph } from '../graph/graph';
import { verifyRanking } from './verify';

/** Throws a LabelError naming the offending path unless labels is a ranking of g. */
export function requireRanking(g: Graph, labels: ArrayLike<number>, what: string): void {
  const verdict = verifyRanking(g, labels);
  if (!verdict.valid) {
    const { label, u, v, path } = verdict.violation;
    throw new LabelError(`${what} needs a ranking: vertices ${u} and ${v} both have label ${label} and the path ${path.join('-')} has no larger label`);
  }
}
