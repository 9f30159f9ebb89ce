import type { Graph } from '../../graph/graph';

export interface RotationRun {
  /** The path when the search stopped (a maximal one unless the budget ran out). */
  path: Int32Array;
  steps: number;
  stoppedByBudget: boolean;
}

/**
 * A longer path from `initial` by greedy extension with Pósa rotations (Pósa, "Hamiltonian circuits in
 * random graphs", Discrete Math. 1976): grow the path from its end, stepping to the unvisited neighbour
 * with the fewest unvisited neighbours but not into a dead end while another step exists (Warnsdorff's
 * rule, common practice; see stepRank). When the end t is stuck, take a neighbour x = path[i] of t and
 * reverse path[i + 1 ..]: the path stays a path (t—x is an edge) and path[i + 1] becomes its end; choose the x closest to the end whose new end has an unvisited neighbour. When no
 * rotation helps, turn the whole path round and grow from the other end. Each step either extends the
 * path or is followed by an extension, so it ends. Steps count vertices added and positions reversed.
 */
export function rotationSearch(g: Graph, initial: ArrayLike<number>, budget: number, stopAt: number): RotationRun {
  const n = g.vertexCount;
  const { offsets, targets } = g;
  const path = new Int32Array(n);
  const pos = new Int32Array(n).fill(-1);
  const free = new Int32Array(n); // unvisited neighbours of each vertex
  for (let v = 0; v < n; v++) free[v] = offsets[v + 1]! - offsets[v]!;
  let len = 0;
  let steps = 0;
  const add = (v: number) => {
    pos[v] = len;
    path[len++] = v;
    for (let e = offsets[v]!, end = offsets[v + 1]!; e < end; e++) free[targets[e]!]!--;
  };
  const reverse = (from: number) => {
    for (let a = from, b = len - 1; a < b; a++, b--) {
      const x = path[a]!;
      path[a] = path[b]!;
      path[b] = x;
      pos[path[a]!] = a;
      pos[x] = b;
    }
    steps += len - from;
  };
  for (let i = 0; i < initial.length; i++) add(initial[i]!);
  steps += initial.length;
  while (len < stopAt) {
    if (steps >= budget) return { path: path.slice(0, len), steps, stoppedByBudget: true };
    const t = path[len - 1]!;
    let next = -1;
    let nextRank = Infinity;
    for (let e = offsets[t]!, end = offsets[t + 1]!; e < end; e++) {
      const w = targets[e]!;
      if (pos[w]! >= 0) continue;
      const rank = stepRank(free[w]!);
      if (next < 0 || rank < nextRank) {
        next = w;
        nextRank = rank;
      }
    }
    if (next >= 0) {
      add(next);
      steps++;
      continue;
    }
    // Stuck at t: the rotation with the shortest reversal whose new end can grow.
    let pivot = -1;
    for (let e = offsets[t]!, end = offsets[t + 1]!; e < end; e++) {
      const i = pos[targets[e]!]!;
      if (i >= 0 && i < len - 2 && free[path[i + 1]!]! > 0 && i > pivot) pivot = i;
    }
    if (pivot >= 0) {
      reverse(pivot + 1);
      continue;
    }
    if (free[path[0]!]! > 0) {
      reverse(0);
      continue;
    }
    break;
  }
  return { path: path.slice(0, len), steps, stoppedByBudget: false };
}

/** Warnsdorff's order for a next step with `free` unvisited neighbours: fewest first, a dead end (0) last. */
export function stepRank(free: number): number {
  return free === 0 ? Infinity : free;
}
