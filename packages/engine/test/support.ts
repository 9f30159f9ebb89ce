import fc from 'fast-check';
import { graphFromEdges, type Graph } from '../src/index';

/** A random simple graph as fast-check data: n vertices and a list of pairs (loops and repeats allowed). */
export const arbitraryGraph = (maxN = 9) =>
  fc
    .integer({ min: 1, max: maxN })
    .chain((n) => fc.tuple(fc.constant(n), fc.array(fc.tuple(fc.nat(n - 1), fc.nat(n - 1)), { maxLength: (n * (n - 1)) / 2 + 3 })));

export function toGraph([n, pairs]: [number, [number, number][]]): Graph {
  return graphFromEdges(n, pairs.flat());
}

/** Adjacency lists straight from the pairs, for checks written independently of the Graph class. */
export function adjacency(n: number, pairs: [number, number][]): Set<number>[] {
  const adj = Array.from({ length: n }, () => new Set<number>());
  for (const [u, v] of pairs) {
    if (u === v) continue;
    adj[u]!.add(v);
    adj[v]!.add(u);
  }
  return adj;
}

/**
 * The definition of a ranking read literally: for each pair of vertices with the same label l, search for
 * a path between them whose inner vertices all have labels below l; finding one means it is no ranking.
 */
export function isRankingByDefinition(adj: Set<number>[], labels: ArrayLike<number>): boolean {
  const n = adj.length;
  for (let u = 0; u < n; u++) {
    for (let v = u + 1; v < n; v++) {
      if (labels[u] !== labels[v]) continue;
      const l = labels[u]!;
      const seen = new Set([u]);
      const stack = [u];
      while (stack.length) {
        const x = stack.pop()!;
        for (const w of adj[x]!) {
          if (w === v) return false;
          if (!seen.has(w) && labels[w]! < l) {
            seen.add(w);
            stack.push(w);
          }
        }
      }
    }
  }
  return true;
}

/** The ruler labelling of P_n: vertex i gets 1 + the number of trailing zero bits of i + 1. */
export function rulerLabels(n: number): number[] {
  return Array.from({ length: n }, (_, i) => 1 + Math.log2((i + 1) & -(i + 1)));
}
