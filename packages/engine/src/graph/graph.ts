import type { Family, GridLayout } from './family';

/**
 * An immutable simple undirected graph in compressed adjacency form: the neighbours of vertex v are
 * targets[offsets[v] .. offsets[v + 1]), sorted ascending. Vertices are 0 .. n - 1.
 */
export class Graph {
  readonly vertexCount: number;
  readonly edgeCount: number;
  readonly offsets: Uint32Array;
  readonly targets: Uint32Array;
  /** What the graph was built as; absent for a graph assembled from raw edges. */
  readonly family: Family | undefined;
  /** Cell positions for grid-like graphs (drawing, label CSV in grid rows). */
  readonly layout: GridLayout | undefined;

  constructor(offsets: Uint32Array, targets: Uint32Array, family?: Family, layout?: GridLayout) {
    if (offsets.length < 1 || offsets[offsets.length - 1] !== targets.length) {
      throw new RangeError('offsets must end at the number of adjacency entries');
    }
    this.vertexCount = offsets.length - 1;
    this.edgeCount = targets.length / 2;
    this.offsets = offsets;
    this.targets = targets;
    this.family = family;
    this.layout = layout;
  }

  degree(v: number): number {
    return this.offsets[v + 1]! - this.offsets[v]!;
  }

  /** A view (no copy) of v's sorted neighbours. */
  neighbours(v: number): Uint32Array {
    return this.targets.subarray(this.offsets[v], this.offsets[v + 1]);
  }

  hasEdge(u: number, v: number): boolean {
    const run = this.neighbours(u);
    let lo = 0;
    let hi = run.length;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (run[mid]! < v) lo = mid + 1;
      else hi = mid;
    }
    return lo < run.length && run[lo] === v;
  }

  /** Each edge once, as [u, v] with u < v, in ascending order. */
  *edges(): IterableIterator<[number, number]> {
    for (let u = 0; u < this.vertexCount; u++) {
      for (const v of this.neighbours(u)) if (u < v) yield [u, v];
    }
  }

  /** The same graph with a family and layout attached (the adjacency is shared, not copied). */
  withFamily(family: Family | undefined, layout: GridLayout | undefined = this.layout): Graph {
    return new Graph(this.offsets, this.targets, family, layout);
  }
}
