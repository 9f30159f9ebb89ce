import { Bitset } from './bitset';
import type { Graph } from './graph';

/**
 * The connected components of the subgraph induced by `subset` (all vertices when absent), each as a
 * Bitset, in order of their smallest vertex. Breadth-first search over a typed-array queue.
 */
export function componentsOf(g: Graph, subset?: Bitset): Bitset[] {
  const n = g.vertexCount;
  const remaining = subset ? subset.clone() : Bitset.full(n);
  const queue = new Uint32Array(n);
  const { offsets, targets } = g;
  const words = remaining.words;
  const out: Bitset[] = [];
  for (let start = remaining.first(); start >= 0; start = remaining.first()) {
    const comp = new Bitset(n);
    let head = 0;
    let tail = 0;
    queue[tail++] = start;
    words[start >>> 5]! &= ~(1 << (start & 31));
    while (head < tail) {
      const v = queue[head++]!;
      comp.words[v >>> 5]! |= 1 << (v & 31);
      for (let e = offsets[v]!, end = offsets[v + 1]!; e < end; e++) {
        const w = targets[e]!;
        const bit = 1 << (w & 31);
        if ((words[w >>> 5]! & bit) !== 0) {
          words[w >>> 5]! &= ~bit;
          queue[tail++] = w;
        }
      }
    }
    out.push(comp);
  }
  return out;
}

/**
 * Component ids for every vertex (-1 outside `subset`), numbered 0.. in order of smallest vertex; the
 * flat form suits large graphs where one Bitset per component would cost too much.
 */
export function componentIds(g: Graph, subset?: Bitset): { ids: Int32Array; count: number } {
  const n = g.vertexCount;
  const ids = new Int32Array(n).fill(-1);
  const queue = new Uint32Array(n);
  const { offsets, targets } = g;
  let count = 0;
  for (let s = 0; s < n; s++) {
    if (ids[s] !== -1 || (subset && !subset.has(s))) continue;
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    ids[s] = count;
    while (head < tail) {
      const v = queue[head++]!;
      for (let e = offsets[v]!, end = offsets[v + 1]!; e < end; e++) {
        const w = targets[e]!;
        if (ids[w] === -1 && (!subset || subset.has(w))) {
          ids[w] = count;
          queue[tail++] = w;
        }
      }
    }
    count++;
  }
  return { ids, count };
}
