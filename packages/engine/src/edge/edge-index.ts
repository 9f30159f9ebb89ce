import type { Graph } from '../graph/graph';

/** The edges of a graph numbered as `g.edges()` yields them, with a way back from adjacency entries. */
export interface EdgeIndex {
  /** ends[2i], ends[2i + 1] are edge i's endpoints u < v. */
  ends: Uint32Array;
  /** entryEdge[e] is the edge whose adjacency entry e is (g.targets[e] from its row's vertex). */
  entryEdge: Uint32Array;
}

/**
 * Numbers the edges in `g.edges()` order (by smaller endpoint, then larger) in one pass over the
 * adjacency. Entry (v, u) with u < v sits among v's first entries, in the same ascending order in which
 * the pass meets u, so a cursor per vertex finds it without search. Each vertex's entries then map to
 * ascending edge numbers (edges from smaller vertices come first).
 */
export function indexEdges(g: Graph): EdgeIndex {
  const n = g.vertexCount;
  const { offsets, targets } = g;
  const ends = new Uint32Array(2 * g.edgeCount);
  const entryEdge = new Uint32Array(targets.length);
  const backCursor = offsets.slice(0, n); // next entry (v, u) with u < v still to number, per v
  let i = 0;
  for (let u = 0; u < n; u++) {
    for (let e = offsets[u]!, stop = offsets[u + 1]!; e < stop; e++) {
      const v = targets[e]!;
      if (v < u) continue;
      ends[2 * i] = u;
      ends[2 * i + 1] = v;
      entryEdge[e] = i;
      entryEdge[backCursor[v]!++] = i;
      i++;
    }
  }
  return { ends, entryEdge };
}

/**
 * For each vertex u, the number (in `g.edges()` order) of the first edge from u to a larger neighbour:
 * the edge from u to the j-th of its neighbours above u is starts[u] + j. One sequential pass, no
 * per-entry table, for callers that only need the numbers of a few edges (a tree's edges, say).
 */
export function edgeNumberStarts(g: Graph): Uint32Array {
  const n = g.vertexCount;
  const { offsets, targets } = g;
  const starts = new Uint32Array(n);
  let count = 0;
  for (let u = 0; u < n; u++) {
    starts[u] = count;
    const stop = offsets[u + 1]!;
    let e = offsets[u]!;
    while (e < stop && targets[e]! < u) e++;
    count += stop - e;
  }
  return starts;
}
