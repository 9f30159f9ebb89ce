import { Bitset } from '../graph/bitset';
import type { Graph } from '../graph/graph';

/** A vertex set of a grid shape seen in its canonical frame. */
export interface CanonicalShape {
  /** Dimensions in word 0, then the cells of the canonical bounding box, row-major. */
  key: Bitset;
  /** The canonical cell index of vertex v (v in the set). */
  toCanonical(v: number): number;
  /** The vertex of the set at canonical cell index i. */
  fromCanonical(i: number): number;
}

/**
 * Canonical forms of cell sets of a grid shape: translate to the bounding box and take the least of the
 * 8 symmetries of the square (DESIGN: "memoise on the shape's canonical form"). Two sets with the same
 * canonical form induce isomorphic subgraphs of the grid, so they have one tree-depth, and the search
 * decides each shape once wherever it appears. Only for graphs whose edges are exactly the side
 * adjacencies of their cells: grids, masks and staircases.
 */
export class ShapeCanon {
  private readonly row: Int32Array;
  private readonly col: Int32Array;
  private readonly vertexAt: Int32Array;
  private readonly cols: number;

  static applies(g: Graph): boolean {
    const kind = g.family?.kind;
    return g.layout !== undefined && (kind === 'grid' || kind === 'mask' || kind === 'staircase');
  }

  constructor(g: Graph) {
    const layout = g.layout!;
    this.cols = layout.cols;
    const n = g.vertexCount;
    this.row = new Int32Array(n);
    this.col = new Int32Array(n);
    this.vertexAt = new Int32Array(layout.rows * layout.cols).fill(-1);
    for (let v = 0; v < n; v++) {
      const cell = layout.cells[v]!;
      this.row[v] = Math.floor(cell / layout.cols);
      this.col[v] = cell % layout.cols;
      this.vertexAt[cell] = v;
    }
  }

  /** The first and last row and column of the cells of `members`. */
  private boundingBox(members: number[]): { r0: number; r1: number; c0: number; c1: number } {
    let r0 = Infinity;
    let r1 = -1;
    let c0 = Infinity;
    let c1 = -1;
    for (const v of members) {
      const r = this.row[v]!;
      const c = this.col[v]!;
      if (r < r0) r0 = r;
      if (r > r1) r1 = r;
      if (c < c0) c0 = c;
      if (c > c1) c1 = c;
    }
    return { r0, r1, c0, c1 };
  }

  /**
   * The maximal full rectangles inside a set's cells (every cell of the rectangle in the set), as
   * [height, width] pairs: the histogram-and-stack method, one pass over the bounding box per row.
   */
  fullRectangles(set: Bitset): [number, number][] {
    const { r0, r1, c0, c1 } = this.boundingBox(set.toArray());
    const w = c1 - c0 + 1;
    const heights = new Int32Array(w);
    const out: [number, number][] = [];
    const stack: number[] = [];
    for (let r = r0; r <= r1; r++) {
      for (let j = 0; j < w; j++) {
        const v = this.vertexAt[r * this.cols + c0 + j]!;
        heights[j] = v >= 0 && set.has(v) ? heights[j]! + 1 : 0;
      }
      stack.length = 0;
      for (let j = 0; j <= w; j++) {
        const h = j < w ? heights[j]! : 0;
        while (stack.length && heights[stack[stack.length - 1]!]! >= h) {
          const height = heights[stack.pop()!]!;
          const left = stack.length ? stack[stack.length - 1]! + 1 : 0;
          if (height > 0) out.push([height, j - left]);
        }
        stack.push(j);
      }
    }
    return out;
  }

  canonical(set: Bitset): CanonicalShape {
    const members = set.toArray();
    const { r0, r1, c0, c1 } = this.boundingBox(members);
    const h = r1 - r0 + 1;
    const w = c1 - c0 + 1;
    let best: Uint32Array | undefined;
    let bestT = 0;
    const words = (h * w + 31) >>> 5;
    for (let t = 0; t < 8; t++) {
      const [H, W] = t < 4 ? [h, w] : [w, h];
      const cand = new Uint32Array(1 + words);
      cand[0] = (H << 16) | W;
      for (const v of members) {
        const i = transformIndex(t, this.row[v]! - r0, this.col[v]! - c0, h, w);
        cand[1 + (i >>> 5)]! |= 1 << (i & 31);
      }
      if (!best || lessThan(cand, best)) {
        best = cand;
        bestT = t;
      }
    }
    const t = bestT;
    const key = new Bitset(32 * best!.length, best);
    const self = this;
    return {
      key,
      toCanonical: (v) => transformIndex(t, self.row[v]! - r0, self.col[v]! - c0, h, w),
      fromCanonical: (i) => {
        const W = t < 4 ? w : h;
        const cr = Math.floor(i / W);
        const cc = i % W;
        const [r, c] = inverse(t, cr, cc, h, w);
        return self.vertexAt[(r + r0) * self.cols + c + c0]!;
      },
    };
  }
}

/** Where cell (r, c) of an h x w box lands under symmetry t, as a row-major index in the new box. */
function transformIndex(t: number, r: number, c: number, h: number, w: number): number {
  switch (t) {
    case 0: return r * w + c;
    case 1: return r * w + (w - 1 - c);
    case 2: return (h - 1 - r) * w + c;
    case 3: return (h - 1 - r) * w + (w - 1 - c);
    case 4: return c * h + r;
    case 5: return c * h + (h - 1 - r);
    case 6: return (w - 1 - c) * h + r;
    default: return (w - 1 - c) * h + (h - 1 - r);
  }
}

/** The cell (r, c) of the h x w box that symmetry t sends to (cr, cc). */
function inverse(t: number, cr: number, cc: number, h: number, w: number): [number, number] {
  switch (t) {
    case 0: return [cr, cc];
    case 1: return [cr, w - 1 - cc];
    case 2: return [h - 1 - cr, cc];
    case 3: return [h - 1 - cr, w - 1 - cc];
    case 4: return [cc, cr];
    case 5: return [h - 1 - cc, cr];
    case 6: return [cc, w - 1 - cr];
    default: return [h - 1 - cc, w - 1 - cr];
  }
}

function lessThan(a: Uint32Array, b: Uint32Array): boolean {
  if (a.length !== b.length) return a.length < b.length;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i]! < b[i]!;
  return false;
}
