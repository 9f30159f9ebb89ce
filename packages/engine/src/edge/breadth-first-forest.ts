import { EngineError } from '../errors';
import type { Graph } from '../graph/graph';
import { edgeNumberStarts } from './edge-index';

/**
 * A forest rooted at the smallest vertex of each tree and laid out in breadth-first order: vertex
 * order[i] sits at position i, and the children of position i occupy positions childStart[i] ..
 * childEnd[i] - 1, one run, so bottom-up passes read children sequentially instead of chasing vertex
 * numbers around memory (what dominates the time on large random trees).
 */
export interface BreadthFirstForest {
  /** The vertex at each position; read backwards, children come before their parents. */
  order: Uint32Array;
  childStart: Uint32Array;
  childEnd: Uint32Array;
  /** For each position, the number (in `g.edges()` order) of the edge up to its parent; -1 at a root. */
  parentEdge: Int32Array;
  /** The largest number of children at any position. */
  maxChildren: number;
}

/** Lays out a forest breadth-first; a cycle is an EngineError('not_a_tree') naming `what`. */
export function breadthFirstForest(g: Graph, what: string): BreadthFirstForest {
  const n = g.vertexCount;
  const cycle = () => new EngineError('not_a_tree', `${what} needs a tree or forest; this graph has a cycle`);
  if (g.edgeCount > 0 && g.edgeCount > n - 1) throw cycle();
  const { offsets, targets } = g;
  const starts = edgeNumberStarts(g);
  const placed = new Uint8Array(n); // small enough to stay in cache, unlike a parent array by vertex
  const order = new Uint32Array(n);
  const parentVertex = new Int32Array(n); // by position
  const childStart = new Uint32Array(n);
  const childEnd = new Uint32Array(n);
  const parentEdge = new Int32Array(n);
  let count = 0;
  let maxChildren = 0;
  for (let root = 0; root < n; root++) {
    if (placed[root]) continue;
    placed[root] = 1;
    parentVertex[count] = -1;
    parentEdge[count] = -1;
    order[count++] = root;
    for (let head = count - 1; head < count; head++) {
      const v = order[head]!;
      const up = parentVertex[head]!;
      childStart[head] = count;
      // Edge numbers are known at the smaller endpoint: starts[v] + the entry's rank above v in v's row.
      let firstAbove = -1;
      for (let e = offsets[v]!, stop = offsets[v + 1]!; e < stop; e++) {
        const w = targets[e]!;
        if (w > v && firstAbove < 0) firstAbove = e;
        if (w === up) {
          if (v < w) parentEdge[head] = starts[v]! + e - firstAbove;
          continue;
        }
        if (placed[w]) throw cycle();
        placed[w] = 1;
        parentVertex[count] = v;
        if (v < w) parentEdge[count] = starts[v]! + e - firstAbove;
        order[count++] = w;
      }
      childEnd[head] = count;
      if (count - childStart[head]! > maxChildren) maxChildren = count - childStart[head]!;
    }
  }
  return { order, childStart, childEnd, parentEdge, maxChildren };
}
