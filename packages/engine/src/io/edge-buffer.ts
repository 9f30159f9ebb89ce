/**
 * Edges as a reader found them, in file order, with where each was written: typed arrays that grow by
 * doubling, so a million edges cost a few allocations rather than a million little arrays.
 */
export class EdgeBuffer {
  /** ends[2k], ends[2k + 1]: the vertex ids of edge k exactly as written (before any base shift). */
  ends: Uint32Array;
  lines: Uint32Array;
  columns: Uint32Array;
  count = 0;

  constructor(capacity = 1024) {
    const size = Math.max(16, Math.floor(capacity));
    this.ends = new Uint32Array(2 * size);
    this.lines = new Uint32Array(size);
    this.columns = new Uint32Array(size);
  }

  push(u: number, v: number, line: number, column: number): void {
    const k = this.count;
    if (k === this.lines.length) this.grow();
    this.ends[2 * k] = u;
    this.ends[2 * k + 1] = v;
    this.lines[k] = line;
    this.columns[k] = column;
    this.count = k + 1;
  }

  private grow(): void {
    const size = 2 * this.lines.length;
    const ends = new Uint32Array(2 * size);
    ends.set(this.ends);
    const lines = new Uint32Array(size);
    lines.set(this.lines);
    const columns = new Uint32Array(size);
    columns.set(this.columns);
    this.ends = ends;
    this.lines = lines;
    this.columns = columns;
  }
}
