import { EngineError } from '../errors';
import type { Graph } from '../graph/graph';

/**
 * An optimal ranking of a tree or forest in linear time, after Schäffer, "Optimal node ranking of trees
 * in linear time", Inform. Process. Lett. 33 (1989). Bottom up, each vertex gets the smallest label that
 * is visible from none of its children and above every label visible from two of them; what stays visible
 * above it is that label and the larger visible ones. Visible sets are bit masks in one 32-bit word, which
 * holds every optimal ranking: a tree on n vertices needs at most ⌊log2 n⌋ + 1 <= 24 labels here.
 */
export function optimalTreeRanking(g: Graph): Int32Array {
  const n = g.vertexCount;
  if (g.edgeCount > n - 1) throw new EngineError('not_a_tree', 'optimalTreeRanking needs a tree or forest; this graph has a cycle');
  const { offsets, targets } = g;
  const labels = new Int32Array(n);
  const visible = new Uint32Array(n);
  const parent = new Int32Array(n).fill(-2); // -2 unvisited
  const order = new Uint32Array(n); // pre-order; reversed, children come before parents
  let count = 0;
  for (let root = 0; root < n; root++) {
    if (parent[root] !== -2) continue;
    parent[root] = -1;
    let head = count;
    order[count++] = root;
    while (head < count) {
      const v = order[head++]!;
      for (let e = offsets[v]!; e < offsets[v + 1]!; e++) {
        const w = targets[e]!;
        if (w === parent[v]) continue;
        if (parent[w] !== -2) throw new EngineError('not_a_tree', 'optimalTreeRanking needs a tree or forest; this graph has a cycle');
        parent[w] = v;
        order[count++] = w;
      }
    }
  }
  const seen = new Uint32Array(n); // OR of the children's visible sets
  const twice = new Uint32Array(n); // labels visible from two or more children
  for (let i = n - 1; i >= 0; i--) {
    const v = order[i]!;
    const acc = seen[v]!;
    const dup = twice[v]!;
    // Smallest free bit above the highest doubly-visible bit.
    const floorBit = dup === 0 ? 0 : 32 - Math.clz32(dup);
    const blocked = acc | ((1 << floorBit) - 1);
    const free = ~blocked & (blocked + 1); // lowest zero bit of blocked
    if (free === 0) throw new EngineError('label_overflow', 'optimalTreeRanking: more than 32 labels would be needed');
    const bit = 31 - Math.clz32(free);
    labels[v] = bit + 1;
    const mine = ((acc >>> bit) << bit) | free; // labels above this one stay visible
    visible[v] = mine >>> 0;
    const p = parent[v]!;
    if (p >= 0) {
      twice[p]! |= seen[p]! & mine;
      seen[p]! |= mine;
    }
  }
  return labels;
}
