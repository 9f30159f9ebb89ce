import type { Graph } from '../graph/graph';

/**
 * The ranking read from an elimination order: eliminate the vertices in `order` (each becomes the parent
 * of the earlier-eliminated parts it touches, as in Liu's elimination-tree algorithm, "A compact row
 * storage scheme for Cholesky factors using elimination trees", ACM TOMS 1986), then label each vertex one
 * above its highest child. Labels grow towards the roots of an elimination forest, in which every edge
 * joins a vertex to an ancestor, so this is a ranking with the forest's height as its number of labels.
 */
export function rankingFromOrder(g: Graph, order: ArrayLike<number>): Int32Array {
  const n = g.vertexCount;
  const position = new Int32Array(n).fill(-1);
  for (let i = 0; i < order.length; i++) position[order[i]!] = i;
  const { offsets, targets } = g;
  const ancestor = new Int32Array(n).fill(-1); // path-compressed pointer towards the current root
  const labels = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const v = order[i]!;
    let height = 0;
    for (let e = offsets[v]!; e < offsets[v + 1]!; e++) {
      let w = targets[e]!;
      if (position[w]! >= i) continue;
      // Climb to the root of w's part, pointing every step at v (v becomes their new root).
      while (ancestor[w] !== -1 && ancestor[w] !== v) {
        const up = ancestor[w]!;
        ancestor[w] = v;
        w = up;
      }
      if (ancestor[w] === -1 && w !== v) {
        ancestor[w] = v;
        if (labels[w]! > height) height = labels[w]!;
      }
    }
    labels[v] = height + 1;
  }
  return labels;
}
