import type { Graph } from '../src/index';

/**
 * Tree-depth by brute force, written independently of the engine's search for the tests: a dynamic
 * program over every vertex subset (bitmasks, n <= 24) using only the defining recursion
 * td(empty) = 0, td(G) = max over components, td(G) = 1 + min_v td(G - v) for connected G
 * (Nešetřil & Ossona de Mendez, Sparsity, 2012).
 */
export function bruteForceTreeDepth(g: Graph): number {
  const n = g.vertexCount;
  if (n > 24) throw new Error('brute force is for at most 24 vertices');
  const adj = new Int32Array(n);
  for (const [u, v] of g.edges()) {
    adj[u]! |= 1 << v;
    adj[v]! |= 1 << u;
  }
  const memo = new Int8Array(1 << n).fill(-1);
  memo[0] = 0;
  const componentOf = (mask: number): number => {
    const low = mask & -mask;
    let comp = low;
    let frontier = low;
    while (frontier) {
      const bit = frontier & -frontier;
      frontier ^= bit;
      const next = adj[31 - Math.clz32(bit)]! & mask & ~comp;
      comp |= next;
      frontier |= next;
    }
    return comp;
  };
  const td = (mask: number): number => {
    const known = memo[mask]!;
    if (known >= 0) return known;
    const comp = componentOf(mask);
    let best: number;
    if (comp !== mask) {
      best = Math.max(td(comp), td(mask & ~comp));
    } else {
      best = 64;
      for (let rest = mask; rest; rest &= rest - 1) {
        const bit = rest & -rest;
        const d = 1 + td(mask & ~bit);
        if (d < best) best = d;
      }
    }
    memo[mask] = best;
    return best;
  };
  return td((1 << n) - 1);
}
