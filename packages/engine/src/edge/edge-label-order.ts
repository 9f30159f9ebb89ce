import { LabelError } from '../errors';
import type { Graph } from '../graph/graph';

/** Edge labels checked against a graph, with the edges in ascending label order. */
export interface EdgeLabelOrder {
  /** Edge numbers sorted by label, ties by number. */
  order: Uint32Array;
  /** groupEnds[k] is the end (exclusive) in `order` of the k-th smallest label's edges. */
  groupEnds: Uint32Array;
  /** The largest label (0 for a graph without edges). */
  top: number;
  /** How many different labels occur. */
  distinct: number;
}

/**
 * Checks that edgeLabels hold one positive whole number per edge of g (a LabelError names the first that
 * does not) and orders the edges by label: a counting sort when the labels are small, as an edge
 * ranking's are, else a comparison sort. The edge analogue of ranking/label-order.ts.
 */
export function orderEdgesByLabel(g: Graph, edgeLabels: ArrayLike<number>): EdgeLabelOrder {
  const m = g.edgeCount;
  if (edgeLabels.length !== m) throw new LabelError(`expected ${m} edge labels, one per edge in g.edges() order, got ${edgeLabels.length}`);
  let top = 0;
  for (let i = 0; i < m; i++) {
    const l = edgeLabels[i]!;
    if (!(l >= 1) || !Number.isSafeInteger(l)) throw new LabelError(`the label of edge ${i} must be a whole number >= 1, got ${l}`);
    if (l > top) top = l;
  }
  if (top > 4 * m + 1024) {
    const order = Uint32Array.from({ length: m }, (_, i) => i).sort((a, b) => edgeLabels[a]! - edgeLabels[b]! || a - b);
    const ends: number[] = [];
    for (let i = 1; i <= m; i++) if (i === m || edgeLabels[order[i]!] !== edgeLabels[order[i - 1]!]) ends.push(i);
    return { order, groupEnds: Uint32Array.from(ends), top, distinct: ends.length };
  }
  const start = new Uint32Array(top + 2);
  for (let i = 0; i < m; i++) start[edgeLabels[i]! + 1]!++;
  let distinct = 0;
  for (let l = 1; l <= top + 1; l++) {
    if (start[l]! > 0) distinct++;
    start[l]! += start[l - 1]!;
  }
  const groupEnds = new Uint32Array(distinct);
  for (let l = 1, k = 0; l <= top; l++) if (start[l + 1]! > start[l]!) groupEnds[k++] = start[l + 1]!;
  const order = new Uint32Array(m);
  for (let i = 0; i < m; i++) order[start[edgeLabels[i]!]!++] = i;
  return { order, groupEnds, top, distinct };
}
