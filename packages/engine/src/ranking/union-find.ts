/** Disjoint sets over 0 .. n - 1 with path halving and union by size; -1 marks an element not yet added. */
export class UnionFind {
  readonly parent: Int32Array;
  private readonly size: Uint32Array;

  constructor(n: number) {
    this.parent = new Int32Array(n).fill(-1);
    this.size = new Uint32Array(n);
  }

  add(x: number): void {
    this.parent[x] = x;
    this.size[x] = 1;
  }

  has(x: number): boolean {
    return this.parent[x] !== -1;
  }

  find(x: number): number {
    const p = this.parent;
    while (p[x] !== x) {
      const up = p[p[x]!]!;
      p[x] = up;
      x = up;
    }
    return x;
  }

  /** Joins the sets of a and b; returns the new root. */
  union(a: number, b: number): number {
    let ra = this.find(a);
    let rb = this.find(b);
    if (ra === rb) return ra;
    if (this.size[ra]! < this.size[rb]!) [ra, rb] = [rb, ra];
    this.parent[rb] = ra;
    this.size[ra]! += this.size[rb]!;
    return ra;
  }
}
