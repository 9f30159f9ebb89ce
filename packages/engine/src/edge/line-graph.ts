import { SizeError } from '../errors';
import { Graph } from '../graph/graph';
import { MAX_EDGES, MAX_VERTICES } from '../graph/limits';
import { indexEdges } from './edge-index';

/** The line graph of g with the edge of g that each of its vertices stands for. */
export interface LineGraph {
  /** Vertex i is edge i of g (in `g.edges()` order); two vertices are adjacent when their edges share an endpoint. */
  graph: Graph;
  /** edges[i] = [u, v], u < v: the edge of g behind vertex i. */
  edges: [number, number][];
}

/** How many edges the line graph of g has: each vertex of degree d joins d(d - 1)/2 pairs of its edges (common practice). */
export function lineGraphEdgeCount(g: Graph): number {
  let count = 0;
  for (let v = 0; v < g.vertexCount; v++) {
    const d = g.degree(v);
    count += (d * (d - 1)) / 2;
  }
  return count;
}

/**
 * The line graph L(g), built straight into adjacency form. Vertex i's neighbours are the other edges at
 * either endpoint of edge i; in a simple graph two edges share at most one endpoint, so merging the two
 * endpoints' (ascending) edge lists gives each row sorted and free of repeats, with no sort at all.
 * Throws a SizeError before allocating when L(g) would have more vertices or edges than a Graph may hold.
 */
export function lineGraph(g: Graph): LineGraph {
  const m = g.edgeCount;
  if (m > MAX_VERTICES) throw new SizeError(`lineGraph: the graph's ${m} edges would be more than the ${MAX_VERTICES} vertices a line graph may have`);
  const lineEdges = lineGraphEdgeCount(g);
  if (lineEdges > MAX_EDGES) {
    throw new SizeError(`lineGraph: the line graph would have ${lineEdges} edges (the sum of deg(v)(deg(v) - 1)/2), more than the ${MAX_EDGES} a graph may have`);
  }
  const { ends, entryEdge } = indexEdges(g);
  const { offsets: gOffsets } = g;
  const offsets = new Uint32Array(m + 1);
  for (let i = 0; i < m; i++) offsets[i + 1] = offsets[i]! + g.degree(ends[2 * i]!) + g.degree(ends[2 * i + 1]!) - 2;
  const targets = new Uint32Array(2 * lineEdges);
  for (let i = 0; i < m; i++) {
    // Merge the edge numbers at u and at v (both ascending), leaving out i itself.
    let a = gOffsets[ends[2 * i]!]!;
    const aEnd = gOffsets[ends[2 * i]! + 1]!;
    let b = gOffsets[ends[2 * i + 1]!]!;
    const bEnd = gOffsets[ends[2 * i + 1]! + 1]!;
    let w = offsets[i]!;
    while (a < aEnd || b < bEnd) {
      const x = a < aEnd ? entryEdge[a]! : Infinity;
      const y = b < bEnd ? entryEdge[b]! : Infinity;
      const next = x < y ? x : y;
      if (x < y) a++;
      else b++;
      if (next !== i) targets[w++] = next;
    }
  }
  const edges: [number, number][] = new Array(m);
  for (let i = 0; i < m; i++) edges[i] = [ends[2 * i]!, ends[2 * i + 1]!];
  return { graph: new Graph(offsets, targets), edges };
}
