/**
 * An immutable simple undirected graph in compressed adjacency form: the neighbours of vertex v are
 * targets[offsets[v] .. offsets[v + 1]), sorted ascending. Vertices are 0 .. n - 1.
 */
export class Graph {
  readonly vertexCount: number;
  readonly edgeCount: number;
  readonly offsets: Uint32Array;
  readonly targets: Uint32Array;

  constructor(offsets: Uint32Array, targets: Uint32Array) {
    if (offsets.length < 1 || offsets[offsets.length - 1] !== targets.length) {
      throw new RangeError('offsets must end at the number of adjacency entries');
    }
    this.vertexCount = offsets.length - 1;
    this.edgeCount = targets.length / 2;
    this.offsets = offsets;
    this.targets = targets;
  }

  degree(v: number): number {
    return this.offsets[v + 1]! - this.offsets[v]!;
  }

  /** A view (no copy) of v's sorted neighbours. */
  neighbours(v: number): Uint32Array {
    return this.targets.subarray(this.offsets[v], this.offsets[v + 1]);
  }
}
