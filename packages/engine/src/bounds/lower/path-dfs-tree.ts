import type { Graph } from '../../graph/graph';
import { stepRank } from './path-rotation';

/**
 * The deepest root-to-leaf path of a depth-first search tree from `start`: every tree path is a path of
 * g, and DFS on sparse, grid-like graphs runs deep (common practice). Vertices stay visited after the
 * search backs out of them, so this is O(n + m), unlike the backtracking search. The next step is
 * always chosen at the moment it is taken, by Warnsdorff's rule (stepRank). Steps count visits and
 * retreats; out of budget, the current stack (a path too) is the candidate. Stops at `stopAt` vertices.
 */
export function deepestDfsPath(g: Graph, start: number, budget: number, stopAt: number): { path: Int32Array; steps: number; stoppedByBudget: boolean } {
  const n = g.vertexCount;
  const { offsets, targets } = g;
  const visited = new Uint8Array(n);
  const free = new Int32Array(n);
  for (let v = 0; v < n; v++) free[v] = offsets[v + 1]! - offsets[v]!;
  const stack = new Int32Array(n);
  const parent = new Int32Array(n); // the DFS tree, so the deepest leaf is recorded in O(1), not copied
  let depth = 0;
  const visit = (v: number) => {
    visited[v] = 1;
    parent[v] = depth > 0 ? stack[depth - 1]! : -1;
    stack[depth++] = v;
    for (let e = offsets[v]!, end = offsets[v + 1]!; e < end; e++) free[targets[e]!]!--;
  };
  visit(start);
  let steps = 1;
  let bestLeaf = start;
  let bestDepth = 1;
  const treePath = (): Int32Array => {
    const path = new Int32Array(bestDepth);
    for (let i = bestDepth - 1, v = bestLeaf; i >= 0; i--, v = parent[v]!) path[i] = v;
    return path;
  };
  while (depth > 0) {
    if (steps >= budget || depth >= stopAt) {
      const path = depth > bestDepth ? stack.slice(0, depth) : treePath();
      return { path, steps, stoppedByBudget: depth < stopAt };
    }
    steps++;
    const t = stack[depth - 1]!;
    let next = -1;
    let nextRank = Infinity;
    for (let e = offsets[t]!, end = offsets[t + 1]!; e < end; e++) {
      const w = targets[e]!;
      if (visited[w]) continue;
      const rank = stepRank(free[w]!);
      if (next < 0 || rank < nextRank) {
        next = w;
        nextRank = rank;
      }
    }
    if (next >= 0) {
      visit(next);
      continue;
    }
    if (depth > bestDepth) {
      bestDepth = depth;
      bestLeaf = t;
    }
    depth--;
  }
  return { path: treePath(), steps, stoppedByBudget: false };
}
