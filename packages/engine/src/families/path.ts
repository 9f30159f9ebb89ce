import { graphFromEdges } from '../graph/from-edges';
import type { Graph } from '../graph/graph';

/** The path P_n: vertices 0 .. n - 1, vertex i joined to i + 1. */
export function pathGraph(n: number): Graph {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`a path needs a whole number of vertices >= 1, got ${n}`);
  const pairs = new Uint32Array(2 * (n - 1));
  for (let i = 0; i + 1 < n; i++) {
    pairs[2 * i] = i;
    pairs[2 * i + 1] = i + 1;
  }
  return graphFromEdges(n, pairs);
}
