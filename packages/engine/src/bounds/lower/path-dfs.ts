import { floorLog2 } from '../../formulas/closed-forms';
import type { Graph } from '../../graph/graph';
import { IntStack } from './growable';
import { stepRank } from './path-rotation';

export interface PathSearchRun {
  /** The path found whose ⌊log2 length⌋ first passed the floor asked for, if any did. */
  path: number[] | undefined;
  steps: number;
  stoppedByBudget: boolean;
}

/**
 * Backtracking DFS over simple paths from `start`, iterative (paths may have millions of vertices).
 * Each frame keeps its untried next steps, sorted by how many unvisited neighbours they have, fewest
 * first and dead ends last (Warnsdorff's rule; common practice). Exhaustive when the budget allows: then
 * it finds the largest ⌊log2 length⌋ of a path from `start`. A path is copied out only when ⌊log2
 * length⌋ passes `floorBest` (only that matters for the bound), so at most ~24 copies. Stops once
 * ⌊log2 length⌋ reaches `cap`.
 */
export function warnsdorffSearch(g: Graph, start: number, budget: number, floorBest: number, cap: number): PathSearchRun {
  const n = g.vertexCount;
  const { offsets, targets } = g;
  const onPath = new Uint8Array(n);
  const free = new Int32Array(n); // unvisited neighbours of each vertex
  for (let v = 0; v < n; v++) free[v] = offsets[v + 1]! - offsets[v]!;
  const path = new IntStack();
  const frameFrom = new IntStack(); // where each frame's candidates begin in `cand`
  const frameNext = new IntStack(); // the next candidate to try
  const cand = new IntStack();
  let best: number[] | undefined;
  let steps = 0;

  const enter = (v: number) => {
    onPath[v] = 1;
    path.push(v);
    for (let e = offsets[v]!, end = offsets[v + 1]!; e < end; e++) free[targets[e]!]!--;
    const from = cand.length;
    for (let e = offsets[v]!, end = offsets[v + 1]!; e < end; e++) {
      const w = targets[e]!;
      if (onPath[w]) continue;
      // Insertion by (free, vertex): neighbour lists are short.
      cand.push(w);
      let j = cand.length - 1;
      const d = cand.data;
      const rank = stepRank(free[w]!);
      while (j > from && (stepRank(free[d[j - 1]!]!) > rank || (stepRank(free[d[j - 1]!]!) === rank && d[j - 1]! > w))) {
        d[j] = d[j - 1]!;
        j--;
      }
      d[j] = w;
    }
    frameFrom.push(from);
    frameNext.push(from);
    if (floorLog2(path.length) > floorBest) {
      floorBest = floorLog2(path.length);
      best = Array.from(path.data.subarray(0, path.length));
    }
  };
  const leave = () => {
    const v = path.data[--path.length]!;
    onPath[v] = 0;
    for (let e = offsets[v]!, end = offsets[v + 1]!; e < end; e++) free[targets[e]!]!++;
    cand.length = frameFrom.data[--frameFrom.length]!;
    frameNext.length--;
  };

  enter(start);
  steps++;
  while (path.length > 0 && floorBest < cap) {
    if (steps >= budget) return { path: best, steps, stoppedByBudget: true };
    const top = frameNext.length - 1;
    const i = frameNext.data[top]!;
    if (i < cand.length) {
      // The top frame is the deepest, so its candidates run to the end of `cand`.
      frameNext.data[top] = i + 1;
      const w = cand.data[i]!;
      if (!onPath[w]) {
        enter(w);
        steps++;
      }
    } else {
      leave();
      steps++;
    }
  }
  return { path: best, steps, stoppedByBudget: false };
}
