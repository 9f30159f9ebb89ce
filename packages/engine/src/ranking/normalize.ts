import type { Graph } from '../graph/graph';
import { orderByLabel } from './label-order';

/**
 * Renumbers the labels 1 .. k keeping their order (k = the number of different labels). A ranking stays
 * a ranking: only the order of labels matters to the definition.
 */
export function normalizeLabels(g: Graph, labels: ArrayLike<number>): Int32Array {
  const { order } = orderByLabel(g, labels);
  const out = new Int32Array(labels.length);
  let rank = 0;
  for (let i = 0; i < order.length; i++) {
    if (i === 0 || labels[order[i]!] !== labels[order[i - 1]!]) rank++;
    out[order[i]!] = rank;
  }
  return out;
}
