import type { Graph } from '../graph/graph';
import { indexEdges, type EdgeIndex } from './edge-index';
import { orderEdgesByLabel } from './edge-label-order';

/** Why a labelling is not an edge ranking: two edges labelled `label` joined by a path of smaller labels. */
export interface EdgeRankingViolation {
  label: number;
  /** The two edges (numbers in `g.edges()` order, e < f) that share the label. */
  e: number;
  f: number;
  /** The vertices of the offending path: e's far end, e's near end, ..., f's near end, f's far end. */
  path: number[];
  /** The edges along it: e first, f last, every inner one labelled below `label`. */
  edges: number[];
}

export type EdgeRankingVerdict =
  | { valid: true; labelsUsed: number; maxLabel: number }
  | { valid: false; labelsUsed: number; maxLabel: number; violation: EdgeRankingViolation };

/**
 * Decides whether edgeLabels (edge i of `g.edges()` gets edgeLabels[i]) is an edge ranking: every path
 * between two edges with the same label has a larger label on it. Two edges labelled l clash exactly when
 * an endpoint of one and an endpoint of the other lie in one component of the subgraph of the edges
 * labelled below l (a shortest path between the two endpoint pairs keeps the whole path simple). So the
 * labels are taken in ascending order over union-find of vertices: each edge labelled l stamps the
 * components of its endpoints with itself, a component stamped by another edge of the same label is the
 * clash, and only then are the edges labelled l joined in. O((V + E) alpha(V)) after a counting sort.
 * Labels that are not one positive whole number per edge are a LabelError, not a verdict.
 */
export function verifyEdgeRanking(g: Graph, edgeLabels: ArrayLike<number>): EdgeRankingVerdict {
  const { order, groupEnds, top } = orderEdgesByLabel(g, edgeLabels);
  const index = indexEdges(g);
  const { ends } = index;
  const n = g.vertexCount;
  const parent = new Int32Array(n);
  for (let v = 0; v < n; v++) parent[v] = v;
  const size = new Uint32Array(n).fill(1);
  const stampLabel = new Float64Array(n); // labels may be any safe integer
  const stampEdge = new Int32Array(n);
  const find = (x: number): number => {
    while (parent[x] !== x) x = parent[x] = parent[parent[x]!]!;
    return x;
  };
  for (let k = 0, start = 0; k < groupEnds.length; k++) {
    const end = groupEnds[k]!;
    const l = edgeLabels[order[start]!]!;
    for (let i = start; i < end; i++) {
      const e = order[i]!;
      for (let side = 0; side < 2; side++) {
        const r = find(ends[2 * e + side]!);
        if (stampLabel[r] === l && stampEdge[r] !== e) {
          return { valid: false, labelsUsed: groupEnds.length, maxLabel: top, violation: nearestClash(g, index, edgeLabels, l, e) };
        }
        stampLabel[r] = l;
        stampEdge[r] = e;
      }
    }
    for (let i = start; i < end; i++) {
      const e = order[i]!;
      let ru = find(ends[2 * e]!);
      let rv = find(ends[2 * e + 1]!);
      if (ru === rv) continue;
      if (size[ru]! < size[rv]!) [ru, rv] = [rv, ru];
      parent[rv] = ru;
      size[ru]! += size[rv]!;
    }
    start = end;
  }
  return { valid: true, labelsUsed: groupEnds.length, maxLabel: top };
}

/**
 * From edge e, the nearest other edge with e's label reached through smaller labels: breadth-first search
 * from both endpoints of e over edges labelled below `label`, checking each vertex's edges as it is
 * reached. The first vertex met with another such edge f gives the path; f's far end cannot already be
 * on it (that vertex would have been met first), so the path is simple.
 */
function nearestClash(g: Graph, index: EdgeIndex, edgeLabels: ArrayLike<number>, label: number, e: number): EdgeRankingViolation {
  const { offsets, targets } = g;
  const { ends, entryEdge } = index;
  const prevVertex = new Int32Array(g.vertexCount).fill(-2); // -2 unreached, -1 an endpoint of e
  const prevEdge = new Int32Array(g.vertexCount).fill(-1);
  const queue: number[] = [ends[2 * e]!, ends[2 * e + 1]!];
  prevVertex[queue[0]!] = -1;
  prevVertex[queue[1]!] = -1;
  for (let head = 0; head < queue.length; head++) {
    const x = queue[head]!;
    for (let a = offsets[x]!; a < offsets[x + 1]!; a++) {
      const f = entryEdge[a]!;
      if (f !== e && edgeLabels[f] === label) return pathOf(ends, prevVertex, prevEdge, label, e, x, targets[a]!, f);
    }
    for (let a = offsets[x]!; a < offsets[x + 1]!; a++) {
      const w = targets[a]!;
      if (prevVertex[w] !== -2 || edgeLabels[entryEdge[a]!]! >= label) continue;
      prevVertex[w] = x;
      prevEdge[w] = entryEdge[a]!;
      queue.push(w);
    }
  }
  throw new Error('unreachable: a clash was found by union-find but not by search');
}

function pathOf(ends: Uint32Array, prevVertex: Int32Array, prevEdge: Int32Array, label: number, e: number, meet: number, farEnd: number, f: number): EdgeRankingViolation {
  const path = [farEnd, meet];
  const edges = [f];
  let x = meet;
  while (prevVertex[x] !== -1) {
    edges.push(prevEdge[x]!);
    x = prevVertex[x]!;
    path.push(x);
  }
  edges.push(e);
  path.push(ends[2 * e]! === x ? ends[2 * e + 1]! : ends[2 * e]!);
  // Built from f back to e; read it from the smaller edge number.
  if (e < f) {
    path.reverse();
    edges.reverse();
  }
  return { label, e: Math.min(e, f), f: Math.max(e, f), path, edges };
}
