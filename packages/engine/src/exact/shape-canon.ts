import { Bitset } from '../graph/bitset';
import type { Graph } from '../graph/graph';

/** How a vertex set of a grid shape maps to its canonical frame and back. */
export interface CellFrame {
  /** The canonical cell index of vertex v (v in the set). */
  toCanonical(v: number): number;
  /** The vertex of the set at canonical cell index i. */
  fromCanonical(i: number): number;
}

/** A vertex set of a grid shape seen in its canonical frame, with its key. */
export interface CanonicalShape extends CellFrame {
  /** Dimensions in word 0, then the cells of the canonical bounding box, row-major. */
  key: Bitset;
}

/**
 * Canonical forms of cell sets of a grid shape: translate to the bounding box and take the least of the
 * 8 symmetries of the square (DESIGN: "memoise on the shape's canonical form"). Two sets with the same
 * canonical form induce isomorphic subgraphs of the grid, so they have one tree-depth, and the search
 * decides each shape once wherever it appears. Only for graphs whose edges are exactly the side
 * adjacencies of their cells: grids, masks and staircases.
 */
/** At most this many rectangles confine a separator: the tightest (least slack, then smallest) are kept. */
const SEPARATOR_RECTANGLES = 256;

export class ShapeCanon {
  /** Each vertex's row and column in the layout. */
  readonly row: Int32Array;
  readonly col: Int32Array;
  private readonly vertexAt: Int32Array;
  private readonly cols: number;
  /** Scratch: the members of the set last scanned, and its bounding box [r0, r1, c0, c1]. */
  readonly members: Int32Array;
  readonly box = new Int32Array(4);
  /** Scratch candidates of canonical(): the one being built and the least so far. */
  private candidate = new Uint32Array(0);
  private least = new Uint32Array(0);
  /** Scratch of prefixCounts: valid until its next call. */
  private prefix = new Int32Array(0);
  /** Scratch of separatorRectangles: for each rectangle, the least slack of one inside it. */
  private slackTable = new Int32Array(0);
  /** Scratch of separatorRectangles: the rectangles no smaller one implies, and the counting sort's places. */
  private foundTable = new Int32Array(0);
  private placeTable = new Int32Array(0);
  /** What the last canonicalKey found: [symmetry, r0, c0, h, w]. */
  readonly lastFrame = new Int32Array(5);

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
    this.members = new Int32Array(n);
    for (let v = 0; v < n; v++) {
      const cell = layout.cells[v]!;
      this.row[v] = Math.floor(cell / layout.cols);
      this.col[v] = cell % layout.cols;
      this.vertexAt[cell] = v;
    }
  }

  /**
   * Lists the set's members into `this.members` (returned count) and its bounding box into `this.box`
   * (first and last row and column): scratch arrays, as this runs for every set the search meets.
   */
  scan(set: Bitset): number {
    let r0 = Infinity;
    let r1 = -1;
    let c0 = Infinity;
    let c1 = -1;
    let count = 0;
    const words = set.words;
    const members = this.members;
    for (let i = 0; i < words.length; i++) {
      let w = words[i]!;
      while (w !== 0) {
        const low = w & -w;
        const v = (i << 5) + (31 - Math.clz32(low));
        w ^= low;
        members[count++] = v;
        const r = this.row[v]!;
        const c = this.col[v]!;
        if (r < r0) r0 = r;
        if (r > r1) r1 = r;
        if (c < c0) c0 = c;
        if (c > c1) c1 = c;
      }
    }
    const box = this.box;
    box[0] = r0;
    box[1] = r1;
    box[2] = c0;
    box[3] = c1;
    return count;
  }

  /** The first and last row and column of the set's cells. */
  private boundingBox(set: Bitset): { r0: number; r1: number; c0: number; c1: number } {
    this.scan(set);
    const box = this.box;
    return { r0: box[0]!, r1: box[1]!, c0: box[2]!, c1: box[3]! };
  }

  /**
   * The maximal full rectangles inside a set's cells (every cell of the rectangle in the set), as
   * [height, width] pairs: the histogram-and-stack method, one pass over the bounding box per row.
   */
  fullRectangles(set: Bitset): [number, number][] {
    const { r0, r1, c0, c1 } = this.boundingBox(set);
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

  /**
   * The set's cells counted over its bounding box: prefix[r * stride + c] = cells of the set in rows < r,
   * columns < c of the box (a 2-D prefix sum), so any window's count costs four reads.
   */
  private prefixCounts(set: Bitset): { r0: number; c0: number; H: number; W: number; stride: number; prefix: Int32Array } {
    // From the member list scan() leaves (no per-cell membership test), into a scratch array: the search
    // asks for this on every shape it meets and again at every budget it tries.
    const count = this.scan(set);
    const box = this.box;
    const r0 = box[0]!;
    const c0 = box[2]!;
    const H = box[1]! - r0 + 1;
    const W = box[3]! - c0 + 1;
    const stride = W + 1;
    const size = (H + 1) * stride;
    if (this.prefix.length < size) this.prefix = new Int32Array(size);
    const prefix = this.prefix;
    prefix.fill(0, 0, size);
    const members = this.members;
    for (let j = 0; j < count; j++) {
      const v = members[j]!;
      prefix[(this.row[v]! - r0 + 1) * stride + this.col[v]! - c0 + 1] = 1;
    }
    // In place: each cell holds its mark until its row's running count replaces it.
    for (let r = 1; r <= H; r++) {
      let run = 0;
      for (let c = 1; c <= W; c++) {
        const at = r * stride + c;
        run += prefix[at]!;
        prefix[at] = prefix[at - stride]! + run;
      }
    }
    return { r0, c0, H, W, stride, prefix };
  }

  /**
   * A lower bound of td(set) from the rectangles of its bounding box: for a rectangle R with a proven
   * value(R), td(set) >= td(set ∩ R) >= value(R) - |R \ set|, since td never grows on subgraphs and
   * removing one vertex lowers it by at most one (DESIGN, "Monotonicity"). With R full this is the plain
   * rectangle bound; a rectangle with a few cells missing often does better.
   */
  rectangleBound(set: Bitset, value: (h: number, w: number) => number): number {
    const { r0, c0, H, W, stride, prefix } = this.prefixCounts(set);
    let best = 0;
    // Largest rectangles first: they usually give the best bound, and then most smaller ones cannot beat
    // it and need no window scan.
    for (let h = H; h >= 1; h--) {
      for (let w = W; w >= 1; w--) {
        const full = value(h, w);
        if (full <= best) continue;
        // The fewest missing cells over the h x w windows of the box.
        let most = 0;
        const area = h * w;
        windows: for (let r = 0; r + h <= H; r++) {
          for (let c = 0; c + w <= W; c++) {
            const inside = prefix[(r + h) * stride + c + w]! - prefix[r * stride + c + w]! - prefix[(r + h) * stride + c]! + prefix[r * stride + c]!;
            if (inside > most) {
              most = inside;
              if (most === area) break windows; // a full window: none can do better
            }
          }
        }
        const bound = full - (h * w - most);
        if (bound > best) best = bound;
      }
    }
    return best;
  }

  /**
   * Where the top of an elimination of `set` in at most k labels can be: td(set - v) <= k - 1 needs
   * value(R) - |R \ set| - [v in R] <= k - 1 for every rectangle R (the bound of rectangleBound), so v
   * lies in every rectangle whose bound is k, and no rectangle may bound the set above k. Returns the
   * intersection of those rectangles as [r0, r1, c0, c1] in grid coordinates (inclusive), or undefined
   * when no top can do.
   */
  topWindow(set: Bitset, k: number, value: (h: number, w: number) => number): [number, number, number, number] | undefined {
    const { r0, c0, H, W, stride, prefix } = this.prefixCounts(set);
    let lo = 0;
    let hi = H - 1;
    let left = 0;
    let right = W - 1;
    for (let h = 1; h <= H; h++) {
      for (let w = 1; w <= W; w++) {
        const need = h * w + k - value(h, w); // a window with at least this many cells bounds the set by k
        if (need > h * w) continue;
        for (let r = 0; r + h <= H; r++) {
          for (let c = 0; c + w <= W; c++) {
            const inside = prefix[(r + h) * stride + c + w]! - prefix[r * stride + c + w]! - prefix[(r + h) * stride + c]! + prefix[r * stride + c]!;
            if (inside < need) continue;
            if (inside > need) return undefined; // bound k + 1 or more: the set does not fit in k labels
            if (r > lo) lo = r;
            if (r + h - 1 < hi) hi = r + h - 1;
            if (c > left) left = c;
            if (c + w - 1 < right) right = c + w - 1;
          }
        }
      }
    }
    if (lo > hi || left > right) return undefined;
    return [lo + r0, hi + r0, left + c0, right + c0];
  }

  /**
   * The rectangles that confine a separator X of `set` when |X| + td(set - X) <= k is asked: by the bound
   * of rectangleBound, td(set - X) >= value(R) - |R \ set| - |R ∩ X|, so X has at most
   * slack = k - value(R) + |R \ set| cells outside R. Returned as [r0, r1, c0, c1, slack] quintuples in grid
   * coordinates, only those with slack below maxSize (the others cannot bind), leaving out those that a
   * smaller rectangle inside, with no more slack, already implies, and of those the SEPARATOR_RECTANGLES
   * tightest (of equal slack the smaller, then in order of size and position). k must be at least the
   * rectangle bound of the set, so that no slack is below zero: the search asks only then.
   */
  separatorRectangles(set: Bitset, k: number, value: (h: number, w: number) => number, maxSize: number): Int32Array {
    const { r0, c0, H, W, stride, prefix } = this.prefixCounts(set);
    // For every rectangle (by its rows and columns), the least slack of a rectangle inside it, itself
    // included; sizes come in increasing order, so those one row or column smaller are filled in already.
    const size = H * H * W * W;
    if (this.slackTable.length < size) this.slackTable = new Int32Array(size);
    const leastInside = this.slackTable;
    // leastInside[((top * H + bottom) * W + left) * W + right]: one row or column less is a fixed step away.
    const downStep = H * W * W;
    const upStep = W * W;
    // The candidates as [r0, r1, c0, c1, slack] in found, with order keys slack * (H * W + 1) + area.
    const rectangles = ((H * (H + 1)) / 2) * ((W * (W + 1)) / 2);
    if (this.foundTable.length < 5 * rectangles) this.foundTable = new Int32Array(5 * rectangles);
    const found = this.foundTable;
    let count = 0;
    for (let h = 1; h <= H; h++) {
      for (let w = 1; w <= W; w++) {
        const base = k - value(h, w) + h * w;
        for (let r = 0; r + h <= H; r++) {
          const b = r + h - 1;
          const topRow = r * stride;
          const bottomRow = (r + h) * stride;
          let at = (r * H + b) * W * W + w - 1;
          for (let c = 0; c + w <= W; c++, at += W + 1) {
            const inside = prefix[bottomRow + c + w]! - prefix[topRow + c + w]! - prefix[bottomRow + c]! + prefix[topRow + c]!;
            let s = base - inside;
            if (s > maxSize) s = maxSize;
            let inner = maxSize;
            if (h > 1) {
              const lower = leastInside[at + downStep]!;
              const upper = leastInside[at - upStep]!;
              if (lower < inner) inner = lower;
              if (upper < inner) inner = upper;
            }
            if (w > 1) {
              const right = leastInside[at + W]!;
              const leftward = leastInside[at - 1]!;
              if (right < inner) inner = right;
              if (leftward < inner) inner = leftward;
            }
            leastInside[at] = s < inner ? s : inner;
            // A rectangle inside with no more slack implies this one; those with maxSize cannot bind.
            if (s >= inner) continue;
            const q = 5 * count++;
            found[q] = r + r0;
            found[q + 1] = b + r0;
            found[q + 2] = c + c0;
            found[q + 3] = c + w - 1 + c0;
            found[q + 4] = s;
          }
        }
      }
    }
    // The tightest first, and of equal slack the smallest: a counting sort by key, cut at the cap.
    const keyOf = (q: number) => found[q + 4]! * (H * W + 1) + (found[q + 1]! - found[q]! + 1) * (found[q + 3]! - found[q + 2]! + 1);
    const keys = maxSize * (H * W + 1);
    if (this.placeTable.length < keys + 1) this.placeTable = new Int32Array(keys + 1);
    const place = this.placeTable;
    place.fill(0, 0, keys + 1);
    for (let i = 0; i < count; i++) place[keyOf(5 * i) + 1]!++;
    for (let key = 0; key < keys; key++) place[key + 1]! += place[key]!;
    const kept = Math.min(count, SEPARATOR_RECTANGLES);
    const out = new Int32Array(5 * kept);
    for (let i = 0; i < count; i++) {
      const q = 5 * i;
      const to = place[keyOf(q)]!++;
      if (to >= kept) continue;
      for (let j = 0; j < 5; j++) out[5 * to + j] = found[q + j]!;
    }
    return out;
  }

  /** How far vertex v lies from the middle of the window (twice the Manhattan distance, so whole). */
  offCentre(v: number, win: readonly [number, number, number, number]): number {
    return Math.abs(2 * this.row[v]! - win[0] - win[1]) + Math.abs(2 * this.col[v]! - win[2] - win[3]);
  }

  /** Whether vertex v lies in the window [r0, r1, c0, c1] (grid coordinates, inclusive). */
  inWindow(v: number, win: readonly [number, number, number, number]): boolean {
    const r = this.row[v]!;
    const c = this.col[v]!;
    return r >= win[0] && r <= win[1] && c >= win[2] && c <= win[3];
  }

  /** The canonical form of a set, as a key and a frame. */
  canonical(set: Bitset): CanonicalShape {
    const length = this.canonicalKey(set);
    const f = this.lastFrame;
    const frame = this.frame(f[0]!, f[1]!, f[2]!, f[3]!, f[4]!);
    return Object.assign(frame, { key: new Bitset(32 * length, this.least.slice(0, length)) });
  }

  /**
   * The canonical key of a set, written into `keyWords` (scratch, valid until the next call; its length
   * is returned), with the symmetry and box that map the set there in `lastFrame` ([t, r0, c0, h, w],
   * for frame()). No allocation: the search calls this for every new set it meets.
   */
  canonicalKey(set: Bitset): number {
    const count = this.scan(set);
    const members = this.members;
    const box = this.box;
    const r0 = box[0]!;
    const c0 = box[2]!;
    const h = box[1]! - r0 + 1;
    const w = box[3]! - c0 + 1;
    const words = (h * w + 31) >>> 5;
    if (this.candidate.length < 1 + words) {
      this.candidate = new Uint32Array(1 + words);
      this.least = new Uint32Array(1 + words);
    }
    let cand = this.candidate;
    let best = this.least;
    let bestT = -1;
    // The key starts with the box's dimensions, so with h < w only the four symmetries keeping the box
    // upright can be least, with h > w only the four turning it; a square needs all eight.
    const tFrom = h > w ? 4 : 0;
    const tTo = h < w ? 4 : 8;
    for (let t = tFrom; t < tTo; t++) {
      cand.fill(0, 0, 1 + words);
      cand[0] = t < 4 ? (h << 16) | w : (w << 16) | h;
      for (let j = 0; j < count; j++) {
        const v = members[j]!;
        const i = transformIndex(t, this.row[v]! - r0, this.col[v]! - c0, h, w);
        cand[1 + (i >>> 5)]! |= 1 << (i & 31);
      }
      if (bestT < 0 || lessThan(cand, best, 1 + words)) {
        const swap = best;
        best = cand;
        cand = swap;
        bestT = t;
      }
    }
    this.candidate = cand;
    this.least = best;
    const f = this.lastFrame;
    f[0] = bestT;
    f[1] = r0;
    f[2] = c0;
    f[3] = h;
    f[4] = w;
    return 1 + words;
  }

  /** The key canonicalKey wrote last. */
  get keyWords(): Uint32Array {
    return this.least;
  }

  /** The frame of symmetry t over the h x w box at (r0, c0), as canonicalKey reported it. */
  frame(t: number, r0: number, c0: number, h: number, w: number): CellFrame {
    return new Frame(t, r0, c0, h, w, this.row, this.col, this.vertexAt, this.cols);
  }
}

/** A set's canonical frame: the symmetry and offset that map it there (no closures kept). */
class Frame implements CellFrame {
  constructor(
    private readonly t: number,
    private readonly r0: number,
    private readonly c0: number,
    private readonly h: number,
    private readonly w: number,
    private readonly row: Int32Array,
    private readonly col: Int32Array,
    private readonly vertexAt: Int32Array,
    private readonly cols: number,
  ) {}

  toCanonical(v: number): number {
    return transformIndex(this.t, this.row[v]! - this.r0, this.col[v]! - this.c0, this.h, this.w);
  }

  fromCanonical(i: number): number {
    const W = this.t < 4 ? this.w : this.h;
    const [r, c] = inverse(this.t, Math.floor(i / W), i % W, this.h, this.w);
    return this.vertexAt[(r + this.r0) * this.cols + c + this.c0]!;
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

function lessThan(a: Uint32Array, b: Uint32Array, length: number): boolean {
  for (let i = 0; i < length; i++) if (a[i] !== b[i]) return a[i]! < b[i]!;
  return false;
}
