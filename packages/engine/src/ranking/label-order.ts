import { LabelError } from '../errors';
import type { Graph } from '../graph/graph';

/** Labels checked against a graph, with the vertices in ascending label order. */
export interface LabelOrder {
  /** Vertices sorted by label, ties by vertex number. */
  order: Uint32Array;
  /** groupEnds[k] is the end (exclusive) in `order` of the k-th smallest label's vertices. */
  groupEnds: Uint32Array;
  /** The largest label. */
  top: number;
}

/**
 * Checks that labels hold one positive whole number per vertex (a LabelError names the first that does
 * not) and orders the vertices by label with a counting sort, as rankings' labels are small; labels far
 * beyond the vertex count fall back to a comparison sort.
 */
export function orderByLabel(g: Graph, labels: ArrayLike<number>): LabelOrder {
  return orderLabels(labels, g.vertexCount, 'vertex', 'one per vertex');
}

/**
 * The same for any numbered items (vertices, edges): `count` labels expected, `noun` names an item in
 * error messages, `expectation` says how the labels are laid out.
 */
export function orderLabels(labels: ArrayLike<number>, count: number, noun: string, expectation: string): LabelOrder {
  const n = count;
  if (labels.length !== n) throw new LabelError(`expected ${n} labels, ${expectation}, got ${labels.length}`);
  let top = 0;
  const whole = labels instanceof Int32Array || labels instanceof Uint32Array; // integers already
  for (let v = 0; v < n; v++) {
    const l = labels[v]!;
    if (!(l >= 1) || !(whole || Number.isSafeInteger(l))) throw new LabelError(`the label of ${noun} ${v} must be a whole number >= 1, got ${l}`);
    if (l > top) top = l;
  }
  if (top > 4 * n + 1024) return comparisonOrder(labels, top);
  const start = new Uint32Array(top + 2);
  for (let v = 0; v < n; v++) start[labels[v]! + 1]!++;
  let distinct = 0;
  for (let l = 1; l <= top + 1; l++) {
    if (start[l]! > 0) distinct++;
    start[l]! += start[l - 1]!;
  }
  const groupEnds = new Uint32Array(distinct);
  for (let l = 1, k = 0; l <= top; l++) if (start[l + 1]! > start[l]!) groupEnds[k++] = start[l + 1]!;
  const order = new Uint32Array(n);
  for (let v = 0; v < n; v++) order[start[labels[v]!]!++] = v;
  return { order, groupEnds, top };
}

function comparisonOrder(labels: ArrayLike<number>, top: number): LabelOrder {
  const n = labels.length;
  const order = Uint32Array.from({ length: n }, (_, i) => i).sort((a, b) => labels[a]! - labels[b]! || a - b);
  const ends: number[] = [];
  for (let i = 1; i <= n; i++) if (i === n || labels[order[i]!] !== labels[order[i - 1]!]) ends.push(i);
  return { order, groupEnds: Uint32Array.from(ends), top };
}
