import type { Graph } from '../../graph/graph';

/** A degeneracy order of a graph, each vertex's core number, and the degeneracy. */
export interface CoreDecomposition {
  /** Vertices in the order they are peeled, by core number; each has at most core[v] neighbours after it. */
  order: Int32Array;
  /** position[v] = the index of v in `order`. */
  position: Int32Array;
  /** core[v] = the largest d such that v lies in a subgraph of minimum degree d; non-decreasing along `order`. */
  core: Int32Array;
  /** The largest core number: max over subgraphs H of min degree(H). 0 for a graph with no edges. */
  degeneracy: number;
}

/**
 * Smallest-last peeling by the linear-time bucket algorithm (Matula & Beck, J. ACM 1983; the array
 * layout of Batagelj & Zaversnik, "An O(m) algorithm for cores decomposition of networks", 2003):
 * vertices sit in one array sorted by current degree with the start of each degree's bucket kept aside,
 * so lowering a degree is a swap to the bucket's front. A degree is never lowered below the level being
 * peeled, so the recorded value is the core number (not always the remaining degree); the vertices with
 * core number >= d form the d-core, a subgraph of minimum degree >= d. O(n + m) time.
 */
export function coreDecomposition(g: Graph): CoreDecomposition {
  const n = g.vertexCount;
  const { offsets, targets } = g;
  const degree = new Int32Array(n);
  let maxDegree = 0;
  for (let v = 0; v < n; v++) {
    degree[v] = offsets[v + 1]! - offsets[v]!;
    if (degree[v]! > maxDegree) maxDegree = degree[v]!;
  }
  // bucketStart[d] = the index in `order` where the vertices of current degree d begin.
  const bucketStart = new Int32Array(maxDegree + 2);
  for (let v = 0; v < n; v++) bucketStart[degree[v]! + 1]!++;
  for (let d = 1; d <= maxDegree + 1; d++) bucketStart[d]! += bucketStart[d - 1]!;
  const order = new Int32Array(n);
  const position = new Int32Array(n);
  const fill = bucketStart.slice(0, maxDegree + 1);
  for (let v = 0; v < n; v++) {
    const p = fill[degree[v]!]!++;
    order[p] = v;
    position[v] = p;
  }
  const removed = new Uint8Array(n);
  const core = new Int32Array(n);
  let degeneracy = 0;
  for (let i = 0; i < n; i++) {
    const v = order[i]!;
    const dv = degree[v]!;
    core[v] = dv;
    if (dv > degeneracy) degeneracy = dv;
    removed[v] = 1;
    for (let e = offsets[v]!, end = offsets[v + 1]!; e < end; e++) {
      const u = targets[e]!;
      if (removed[u]) continue;
      const du = degree[u]!;
      if (du <= dv) continue; // du === dv: u stays at level dv (its core number is at least dv)
      // Swap u with the first vertex of its bucket, then shrink the bucket from the front.
      const front = bucketStart[du]!;
      const w = order[front]!;
      if (w !== u) {
        const pu = position[u]!;
        order[front] = u;
        position[u] = front;
        order[pu] = w;
        position[w] = pu;
      }
      bucketStart[du]!++;
      degree[u] = du - 1;
    }
  }
  return { order, position, core, degeneracy };
}
