import type { Graph } from '../graph/graph';
import { orderByLabel } from './label-order';

/** Why a labelling is not a ranking: two vertices with label `label` joined by a path of smaller labels. */
export interface RankingViolation {
  label: number;
  u: number;
  v: number;
  /** The vertices of the offending path from u to v, both ends included; the inner ones are all below `label`. */
  path: number[];
}

export type RankingVerdict =
  | { valid: true; labelsUsed: number; maxLabel: number }
  | { valid: false; labelsUsed: number; maxLabel: number; violation: RankingViolation };

/**
 * Decides whether labels is a ranking of g: every path between two vertices with the same label passes a
 * larger label. Labels are taken in ascending order and merged with union-find: a labelling is a ranking
 * exactly when no component of the subgraph induced by the labels <= l holds two vertices labelled l
 * (common practice), that is, when adding the vertices labelled l never joins two sets that each hold one. O((V + E) * alpha(V)) after a counting sort of the labels. Labels that are not one
 * positive whole number per vertex are a LabelError, not a verdict.
 */
export function verifyRanking(g: Graph, labels: ArrayLike<number>): RankingVerdict {
  const n = g.vertexCount;
  const { order, groupEnds, top } = orderByLabel(g, labels);
  const label = labels instanceof Int32Array ? labels : Int32Array.from(labels); // one array kind: monomorphic loops
  const { offsets, targets } = g;
  // Union-find inlined (the hot loop of the whole engine): parent -1 is not yet added, roots point to
  // themselves; path halving and union by size. stamp[root] === l marks a set that already
  // holds a vertex labelled l: joining two such sets is the violation.
  const parent = new Int32Array(n).fill(-1);
  const stamp = new Int32Array(n);
  const size = new Uint32Array(n);
  for (let k = 0, start = 0; k < groupEnds.length; k++) {
    const end = groupEnds[k]!;
    const l = label[order[start]!]!;
    for (let i = start; i < end; i++) {
      const v = order[i]!;
      parent[v] = v;
      stamp[v] = l;
      size[v] = 1;
    }
    for (let i = start; i < end; i++) {
      const v = order[i]!;
      let rv = v;
      while (parent[rv] !== rv) rv = parent[rv] = parent[parent[rv]!]!;
      for (let e = offsets[v]!, stop = offsets[v + 1]!; e < stop; e++) {
        let rw = targets[e]!;
        if (parent[rw] === -1) continue;
        while (parent[rw] !== rw) rw = parent[rw] = parent[parent[rw]!]!;
        if (rw === rv) continue;
        if (stamp[rw] === l) {
          return { valid: false, labelsUsed: groupEnds.length, maxLabel: top, violation: nearestClash(g, label, l, v) };
        }
        // Union by size keeps the trees shallow; the joined set holds v, so it carries the stamp.
        if (size[rw]! > size[rv]!) {
          parent[rv] = rw;
          size[rw]! += size[rv]!;
          stamp[rw] = l;
          rv = rw;
        } else {
          parent[rw] = rv;
          size[rv]! += size[rw]!;
        }
      }
    }
    start = end;
  }
  return { valid: true, labelsUsed: groupEnds.length, maxLabel: top };
}

/**
 * From v, a shortest path to another vertex with v's label whose inner vertices are all below it
 * (breadth-first search through smaller labels). One exists whenever v's component of the subgraph
 * of labels <= label holds another vertex labelled `label`: the nearest one is reached that way.
 */
function nearestClash(g: Graph, labels: ArrayLike<number>, label: number, v: number): RankingViolation {
  const prev = new Int32Array(g.vertexCount).fill(-1);
  prev[v] = v;
  const queue = [v];
  for (let head = 0; head < queue.length; head++) {
    const x = queue[head]!;
    for (const w of g.neighbours(x)) {
      if (prev[w] !== -1 || labels[w]! > label) continue;
      prev[w] = x;
      if (labels[w] === label) {
        const path = [w];
        for (let y = w; y !== v; y = prev[y]!) path.push(prev[y]!);
        return { label, u: v, v: w, path: path.reverse() };
      }
      queue.push(w);
    }
  }
  throw new Error('unreachable: a clash was found by union-find but not by search');
}
