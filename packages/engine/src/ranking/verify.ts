import type { Graph } from '../graph/graph';

/** Why a labelling is not a ranking: two vertices with one label joined by a path of no larger label. */
export interface RankingViolation {
  label: number;
  u: number;
  v: number;
  /** The vertices of the offending path from u to v, both ends included. */
  path: number[];
}

export type RankingVerdict =
  | { valid: true; labelsUsed: number; maxLabel: number }
  | { valid: false; violation: RankingViolation };

/**
 * Decides whether labels is a ranking of g: every path between two vertices with the same label passes a
 * larger label. Labels are processed in ascending order and merged with union-find: a ranking is exactly a
 * labelling in which no component of the subgraph induced by labels <= l holds two vertices labelled l
 * (common practice). O((V + E) * alpha) after sorting the vertices by label.
 */
export function verifyRanking(g: Graph, labels: ArrayLike<number>): RankingVerdict {
  const n = g.vertexCount;
  if (labels.length !== n) throw new RangeError(`expected ${n} labels, got ${labels.length}`);
  let top = 0;
  for (let v = 0; v < n; v++) {
    const l = labels[v]!;
    if (!Number.isInteger(l) || l < 1) throw new RangeError(`label of vertex ${v} must be a whole number >= 1, got ${l}`);
    if (l > top) top = l;
  }
  const order = verticesByLabel(labels, top);
  const parent = new Int32Array(n).fill(-1); // -1: not yet added
  const find = (x: number): number => {
    let r = x;
    while (parent[r] !== r) r = parent[r]!;
    while (parent[x] !== r) {
      const next = parent[x]!;
      parent[x] = r;
      x = next;
    }
    return r;
  };
  const holder = new Int32Array(n).fill(-1); // root -> a vertex labelled with the current label in that component
  let labelsUsed = 0;
  for (let start = 0; start < n; ) {
    const label = labels[order[start]!]!;
    let end = start;
    while (end < n && labels[order[end]!] === label) end++;
    labelsUsed++;
    for (let i = start; i < end; i++) parent[order[i]!] = order[i]!;
    for (let i = start; i < end; i++) {
      const v = order[i]!;
      for (const w of g.neighbours(v)) {
        if (parent[w] === -1) continue;
        const a = find(v);
        const b = find(w);
        if (a !== b) parent[a] = b;
      }
    }
    for (let i = start; i < end; i++) {
      const v = order[i]!;
      const root = find(v);
      const other = holder[root]!;
      if (other >= 0 && labels[other] === label) {
        return { valid: false, violation: { label, u: other, v, path: pathWithin(g, labels, label, other, v) } };
      }
      holder[root] = v;
    }
    start = end;
  }
  const maxLabel = n === 0 ? 0 : labels[order[n - 1]!]!;
  return { valid: true, labelsUsed, maxLabel };
}

/** The vertices in ascending label order: a counting sort when the labels are small, as rankings' are. */
function verticesByLabel(labels: ArrayLike<number>, top: number): Uint32Array {
  const n = labels.length;
  if (top > 4 * n + 1024) return Uint32Array.from({ length: n }, (_, i) => i).sort((a, b) => labels[a]! - labels[b]!);
  const start = new Uint32Array(top + 2);
  for (let v = 0; v < n; v++) start[labels[v]! + 1]!++;
  for (let l = 1; l <= top + 1; l++) start[l]! += start[l - 1]!;
  const order = new Uint32Array(n);
  for (let v = 0; v < n; v++) order[start[labels[v]!]!++] = v;
  return order;
}

/** A shortest path from u to v through vertices labelled at most `label` (breadth-first search). */
function pathWithin(g: Graph, labels: ArrayLike<number>, label: number, u: number, v: number): number[] {
  const prev = new Int32Array(g.vertexCount).fill(-1);
  prev[u] = u;
  const queue = [u];
  for (let head = 0; head < queue.length; head++) {
    const x = queue[head]!;
    if (x === v) break;
    for (const w of g.neighbours(x)) {
      if (prev[w] === -1 && labels[w]! <= label) {
        prev[w] = x;
        queue.push(w);
      }
    }
  }
  const path = [v];
  for (let x = v; x !== u; x = prev[x]!) path.push(prev[x]!);
  return path.reverse();
}
