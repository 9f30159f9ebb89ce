import type { Bitset } from '../graph/bitset';

/**
 * The cut vertices of the connected subgraph induced by `set`, by depth-first search with low points
 * (Hopcroft & Tarjan, "Efficient algorithms for graph manipulation", Comm. ACM 16, 1973), iterative and
 * on preallocated arrays. The search uses it to know, before removing a top v, whether set - v is still
 * one component (then it needs no component search).
 */
export class CutVertices {
  private readonly order: Int32Array;
  private readonly low: Int32Array;
  private readonly parent: Int32Array;
  private readonly edgeAt: Int32Array;
  private readonly stack: Int32Array;
  private readonly children: Int32Array;

  constructor(
    private readonly offsets: Uint32Array,
    private readonly targets: Uint32Array,
  ) {
    const n = offsets.length - 1;
    this.order = new Int32Array(n);
    this.low = new Int32Array(n);
    this.parent = new Int32Array(n);
    this.edgeAt = new Int32Array(n);
    this.stack = new Int32Array(n);
    this.children = new Int32Array(n);
  }

  /** The cut vertices of the (connected) set, added to `into` (a fresh set: searches nest). */
  find(set: Bitset, root: number, into: Bitset): Bitset {
    const { order, low, parent, edgeAt, stack, children, offsets, targets } = this;
    const words = set.words;
    for (let i = 0; i < words.length; i++) {
      let w = words[i]!;
      while (w !== 0) {
        const low1 = w & -w;
        w ^= low1;
        const v = (i << 5) + (31 - Math.clz32(low1));
        order[v] = -1;
        children[v] = 0;
      }
    }
    let time = 0;
    let top = 0;
    stack[top++] = root;
    order[root] = low[root] = time++;
    parent[root] = -1;
    edgeAt[root] = offsets[root]!;
    while (top > 0) {
      const v = stack[top - 1]!;
      const e = edgeAt[v]!;
      if (e < offsets[v + 1]!) {
        edgeAt[v] = e + 1;
        const u = targets[e]!;
        if ((words[u >>> 5]! & (1 << (u & 31))) === 0) continue;
        if (order[u] === -1) {
          order[u] = low[u] = time++;
          parent[u] = v;
          edgeAt[u] = offsets[u]!;
          children[v]!++;
          stack[top++] = u;
        } else if (u !== parent[v] && order[u]! < low[v]!) {
          low[v] = order[u]!;
        }
        continue;
      }
      top--;
      const p = parent[v]!;
      if (p >= 0) {
        if (low[v]! < low[p]!) low[p] = low[v]!;
        if (parent[p] !== -1 && low[v]! >= order[p]!) into.add(p);
      }
    }
    if (children[root]! > 1) into.add(root);
    return into;
  }
}
