import { popcount32, type Bitset } from '../graph/bitset';

/**
 * Minor-min-width of the subgraph induced by a vertex set (Gogate & Dechter, UAI 2004, with the min-d
 * rule, as bounds/lower/minor-min-width.ts computes it for whole graphs): take a vertex of least degree,
 * note its degree, contract it into its neighbour of least degree; td >= tw + 1 >= the largest degree
 * noted + 1. On the set's own adjacency words, copied into scratch rows, for the small sets the search
 * meets in general graphs (where degeneracy, at most 3 or so on sparse graphs, prunes little).
 */
export class SetMinorMinWidth {
  private readonly rows: Uint32Array;
  private readonly alive: Uint32Array;
  private readonly degree: Int32Array;
  private readonly members: Int32Array;
  private readonly words: number;

  constructor(
    private readonly n: number,
    private readonly adj: readonly Bitset[],
  ) {
    this.words = (n + 31) >>> 5;
    this.rows = new Uint32Array(n * this.words);
    this.alive = new Uint32Array(this.words);
    this.degree = new Int32Array(n);
    this.members = new Int32Array(n);
  }

  /** The bound td(set) >= width + 1 for a non-empty set. */
  bound(set: Bitset): number {
    const { rows, alive, degree, members, words, adj } = this;
    let count = 0;
    const sw = set.words;
    for (let i = 0; i < words; i++) {
      alive[i] = sw[i]!;
      let w = sw[i]!;
      while (w !== 0) {
        const low = w & -w;
        w ^= low;
        members[count++] = (i << 5) + (31 - Math.clz32(low));
      }
    }
    for (let j = 0; j < count; j++) {
      const v = members[j]!;
      const aw = adj[v]!.words;
      let d = 0;
      for (let i = 0; i < words; i++) {
        const x = aw[i]! & sw[i]!;
        rows[v * words + i] = x;
        d += popcount32(x);
      }
      degree[v] = d;
    }
    let width = 0;
    for (let left = count; left > 1; left--) {
      // The live vertex of least degree.
      let v = -1;
      for (let j = 0; j < count; j++) {
        const u = members[j]!;
        if ((alive[u >>> 5]! & (1 << (u & 31))) !== 0 && (v < 0 || degree[u]! < degree[v]!)) v = u;
      }
      const dv = degree[v]!;
      if (dv > width) width = dv;
      alive[v >>> 5]! &= ~(1 << (v & 31));
      if (dv === 0) continue;
      // Its neighbour of least degree takes its edges (a contraction).
      let u = -1;
      for (let i = 0; i < words; i++) {
        let w = rows[v * words + i]!;
        while (w !== 0) {
          const low = w & -w;
          w ^= low;
          const x = (i << 5) + (31 - Math.clz32(low));
          if (u < 0 || degree[x]! < degree[u]!) u = x;
        }
      }
      for (let i = 0; i < words; i++) {
        let w = rows[v * words + i]!;
        while (w !== 0) {
          const low = w & -w;
          w ^= low;
          const x = (i << 5) + (31 - Math.clz32(low));
          // x loses v; if x is not u and not yet u's neighbour, x and u become neighbours.
          rows[x * words + (v >>> 5)]! &= ~(1 << (v & 31));
          degree[x]!--;
          if (x !== u && (rows[u * words + (x >>> 5)]! & (1 << (x & 31))) === 0) {
            rows[u * words + (x >>> 5)]! |= 1 << (x & 31);
            rows[x * words + (u >>> 5)]! |= 1 << (u & 31);
            degree[u]!++;
            degree[x]!++;
          }
        }
      }
    }
    return width + 1;
  }
}
