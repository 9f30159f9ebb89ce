import type { Graph } from '../graph/graph';
import { orderByLabel } from './label-order';
import { requireRanking } from './require-ranking';
import { UnionFind } from './union-find';

export type MinimalityVerdict =
  | { minimal: true }
  | { minimal: false; /** Lowering this vertex's label to `to` still gives a ranking. */ lowerable: { vertex: number; from: number; to: number } };

/**
 * Whether no single label of a ranking can be lowered. For a vertex v and a label k < f(v), let
 * reach_k(v) be the set of vertices labelled k that v's neighbours reach through labels below k
 * (in a ranking each component of labels < k touches at most one of them). Lowering v to j breaks the
 * ranking exactly when reach_j(v) is non-empty (v would meet a j) or |reach_k(v)| >= 2 for some
 * j < k < f(v) (v would be the only larger label between two k's). One sweep over ascending labels with
 * union-find finds every |reach_k(v)|, capped at 2: O(E * L * alpha) for L labels.
 */
export function isMinimalRanking(g: Graph, labels: ArrayLike<number>): MinimalityVerdict {
  requireRanking(g, labels, 'isMinimalRanking');
  const n = g.vertexCount;
  const { order } = orderByLabel(g, labels);
  const { offsets, targets } = g;
  const sets = new UnionFind(n);
  const touching = new Int32Array(n).fill(-1); // root -> the vertex labelled k its component touches
  const stamp = new Int32Array(n).fill(-1); // root -> the label k at which `touching` was set
  // Per vertex, over the labels k < f(v) seen so far: the largest k with |reach_k| >= 2 (lowering to
  // k or below is blocked) and the largest j above that with reach_j empty (lowering to j works), or 0.
  const blocked = new Int32Array(n);
  const free = new Int32Array(n);
  const previousLabel = new Map<number, number>();
  let prev = 0;
  let i = 0;
  while (i < n) {
    const k = labels[order[i]!]!;
    let end = i;
    while (end < n && labels[order[end]!] === k) end++;
    previousLabel.set(k, prev);
    // Components of labels < k are in `sets`; mark the k each one touches.
    for (let a = i; a < end; a++) {
      const x = order[a]!;
      for (let e = offsets[x]!; e < offsets[x + 1]!; e++) {
        const w = targets[e]!;
        if (!sets.has(w)) continue;
        const r = sets.find(w);
        touching[r] = x;
        stamp[r] = k;
      }
    }
    for (let a = end; a < n; a++) {
      const v = order[a]!;
      if (k - 1 > prev) free[v] = k - 1; // a label no vertex holds
      let first = -1;
      let c = 0;
      for (let e = offsets[v]!; e < offsets[v + 1]! && c < 2; e++) {
        const w = targets[e]!;
        let reached = -1;
        if (labels[w] === k) reached = w;
        else if (sets.has(w)) {
          const r = sets.find(w);
          if (stamp[r] === k) reached = touching[r]!;
        }
        if (reached < 0 || reached === first) continue;
        if (c === 0) first = reached;
        c++;
      }
      if (c >= 2) {
        blocked[v] = k;
        free[v] = 0;
      } else if (c === 0) {
        free[v] = k;
      }
    }
    for (let a = i; a < end; a++) {
      const x = order[a]!;
      sets.add(x);
      for (let e = offsets[x]!; e < offsets[x + 1]!; e++) if (sets.has(targets[e]!)) sets.union(x, targets[e]!);
    }
    prev = k;
    i = end;
  }
  for (let v = 0; v < n; v++) {
    const f = labels[v]!;
    let to = free[v]!;
    if (f - 1 > previousLabel.get(f)!) to = f - 1; // the gap just below f(v)
    if (to > blocked[v]! && to >= 1) return { minimal: false, lowerable: { vertex: v, from: f, to } };
  }
  return { minimal: true };
}
