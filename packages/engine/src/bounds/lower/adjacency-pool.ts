import type { Graph } from '../../graph/graph';

/**
 * Mutable adjacency lists for contraction, all in one growable Int32Array: vertex v's neighbours are
 * pool[start[v] .. start[v] + length[v]), unordered. A list that outgrows its room moves to the end of
 * the pool with twice the room (amortised O(1) per added entry; common practice). No per-vertex objects,
 * so graphs of 10^5–10^6 vertices stay cheap.
 */
export class AdjacencyPool {
  readonly start: Int32Array;
  readonly length: Int32Array;
  private readonly room: Int32Array;
  pool: Int32Array;
  private used: number;

  constructor(g: Graph) {
    const n = g.vertexCount;
    this.start = new Int32Array(n);
    this.length = new Int32Array(n);
    this.room = new Int32Array(n);
    const entries = g.targets.length;
    this.pool = new Int32Array(Math.max(16, entries + (entries >> 1)));
    this.pool.set(g.targets);
    for (let v = 0; v < n; v++) {
      this.start[v] = g.offsets[v]!;
      this.length[v] = this.room[v] = g.offsets[v + 1]! - g.offsets[v]!;
    }
    this.used = entries;
  }

  /** The index of x in v's list, or -1. */
  indexOf(v: number, x: number): number {
    const { pool } = this;
    for (let i = this.start[v]!, end = i + this.length[v]!; i < end; i++) if (pool[i] === x) return i;
    return -1;
  }

  /** Removes x from v's list (the last entry takes its place); x must be there. */
  remove(v: number, x: number): void {
    const i = this.indexOf(v, x);
    const last = this.start[v]! + --this.length[v]!;
    this.pool[i] = this.pool[last]!;
  }

  /** Replaces x by y in v's list; x must be there. */
  replace(v: number, x: number, y: number): void {
    this.pool[this.indexOf(v, x)] = y;
  }

  /** Appends x to v's list. */
  add(v: number, x: number): void {
    if (this.length[v] === this.room[v]) this.grow(v);
    this.pool[this.start[v]! + this.length[v]!++] = x;
  }

  private grow(v: number): void {
    const room = 2 * this.room[v]! + 4;
    if (this.used + room > this.pool.length) {
      const bigger = new Int32Array(Math.max(2 * this.pool.length, this.used + room));
      bigger.set(this.pool.subarray(0, this.used));
      this.pool = bigger;
    }
    this.pool.copyWithin(this.used, this.start[v]!, this.start[v]! + this.length[v]!);
    this.start[v] = this.used;
    this.room[v] = room;
    this.used += room;
  }
}
