import type { Graph } from '../graph/graph';
import { orderByLabel } from './label-order';
import { requireRanking } from './require-ranking';
import { UnionFind } from './union-find';

/**
 * The elimination forest of a ranking: parent[v] is the vertex with the smallest label above v's that
 * separates v's component of the smaller labels from the rest, or -1 for a root. Built bottom-up over
 * ascending labels with union-find, as elimination trees are in sparse factorisation (Liu, "The role of
 * elimination trees in sparse factorization", SIAM J. Matrix Anal. Appl. 1990). Labels strictly grow
 * along every parent link, so the depth is at most the number of labels used, and every edge of g joins
 * a vertex to one of its ancestors.
 */
export function eliminationForest(g: Graph, labels: ArrayLike<number>): Int32Array {
  requireRanking(g, labels, 'eliminationForest');
  const n = g.vertexCount;
  const { order } = orderByLabel(g, labels);
  const { offsets, targets } = g;
  const sets = new UnionFind(n);
  const top = new Int32Array(n); // root of a set -> its highest-labelled vertex, the subtree's root
  const parent = new Int32Array(n).fill(-1);
  for (let i = 0; i < n; i++) {
    const v = order[i]!;
    sets.add(v);
    top[v] = v;
    for (let e = offsets[v]!; e < offsets[v + 1]!; e++) {
      const w = targets[e]!;
      if (!sets.has(w) || labels[w]! >= labels[v]!) continue;
      const rw = sets.find(w);
      const rv = sets.find(v);
      if (rw === rv) continue;
      parent[top[rw]!] = v;
      top[sets.union(rv, rw)] = v;
    }
  }
  return parent;
}
