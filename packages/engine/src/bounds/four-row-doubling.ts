import { SizeError } from '../errors';
import { TreeDepthSearch } from '../exact/tree-depth-search';
import { maskGraph } from '../families/mask';
import { floorLog2 } from '../formulas/closed-forms';
import { Bitset } from '../graph/bitset';
import type { UpperBound } from './upper-bound';

/*
 * A block: rows 0..R-1 (R <= 4) of a strip of length L, row r running from column P_r to column
 * L - 1 - Q_r. The left profile P and the right profile Q say how far each row falls short of the
 * block's ends; both have a row with 0, and neighbouring rows differ by at most 1 (cuts leave such ends,
 * and the grid's own ends are flat). A profile is kept as R base-4 digits, row 0 lowest.
 */
const digit = (p: number, r: number) => (p >> (2 * r)) & 3;

function reversed(p: number, rows: number): number {
  let out = 0;
  for (let r = 0; r < rows; r++) out |= digit(p, r) << (2 * (rows - 1 - r));
  return out;
}

/** The profiles of each row count: offsets in 0..R-1, least 0, neighbours within 1 (3^(R-1) of them). */
const PROFILES: number[][] = [[]];
for (let rows = 1; rows <= 4; rows++) {
  const list: number[] = [];
  for (let p = 0; p < 1 << (2 * rows); p++) {
    let least = 3;
    let ok = true;
    for (let r = 0; r < rows; r++) {
      least = Math.min(least, digit(p, r));
      if (r > 0 && Math.abs(digit(p, r) - digit(p, r - 1)) > 1) ok = false;
    }
    if (ok && least === 0) list.push(p);
  }
  PROFILES.push(list);
}

const keyOf = (rows: number, p: number, q: number, length: number) => ((rows * 256 + p) * 256 + q) * 16_777_216 + length;

/** Blocks of at most this many cells are ranked by exact search. */
const LEAF_CELLS = 16;
const LEAF_EXACT = -1;
const LEAF_PATH = -2;

function cellsOf(rows: number, p: number, q: number, length: number): number {
  let cells = 0;
  for (let r = 0; r < rows; r++) cells += length - digit(p, r) - digit(q, r);
  return cells;
}

/**
 * The least key among a block's four mirror images (left-right, top-bottom), as canonical() leaves it:
 * which image gave it (bit 0 left-right, bit 1 top-bottom) and that image's profiles.
 */
const image = { key: 0, mirror: 0, p: 0, q: 0 };
function canonical(rows: number, p: number, q: number, length: number): typeof image {
  image.key = keyOf(rows, p, q, length);
  image.mirror = 0;
  image.p = p;
  image.q = q;
  // Left-right: the right profile becomes the left one; top-bottom: rows in reverse order.
  consider(rows, q, p, length, 1);
  consider(rows, reversed(p, rows), reversed(q, rows), length, 2);
  consider(rows, reversed(q, rows), reversed(p, rows), length, 3);
  return image;
}

function consider(rows: number, p: number, q: number, length: number, mirror: number): void {
  const key = keyOf(rows, p, q, length);
  if (key >= image.key) return;
  image.key = key;
  image.mirror = mirror;
  image.p = p;
  image.q = q;
}

/** One side of a cut: a block, and where its row 0 and column 0 sit in the block that was cut. */
interface Side {
  rows: number;
  p: number;
  q: number;
  length: number;
  row: number;
  col: number;
}

/**
 * The side of the cut (columns c_r, one per row) that keeps, in row r, the cells from `from[r]` to
 * `to[r]`; null when it is empty, undefined when its rows are not consecutive (the cut is not tried).
 */
function sideOf(rows: number, from: Int32Array, to: Int32Array): Side | null | undefined {
  let first = -1;
  let last = -1;
  for (let r = 0; r < rows; r++) {
    if (from[r]! > to[r]!) continue;
    if (first < 0) first = r;
    else if (last !== r - 1) return undefined;
    last = r;
  }
  if (first < 0) return null;
  let lo = Infinity;
  let hi = -Infinity;
  for (let r = first; r <= last; r++) {
    lo = Math.min(lo, from[r]!);
    hi = Math.max(hi, to[r]!);
  }
  let p = 0;
  let q = 0;
  for (let r = first; r <= last; r++) {
    p |= (from[r]! - lo) << (2 * (r - first));
    q |= (hi - to[r]!) << (2 * (r - first));
  }
  return { rows: last - first + 1, p, q, length: hi - lo + 1, row: first, col: lo };
}

// Exact leaves are pure functions of the block, so every instance shares them.
const exactLeaves = new Map<number, { value: number; labels: Int32Array }>();

/** Where a block's cells go: global row = row + rowSign * r, global column = col + colSign * y. */
interface Placement {
  row: number;
  rowSign: number;
  col: number;
  colSign: number;
}

/**
 * Four-row doubling for 4 x n grids (Cairn's own construction, in the spirit of the 4 x n results of
 * arXiv:1208.1814 (2012), "On the rank number of grid graphs", but not taken from it). A block is cut by
 * a middle cut set of one cell per row, the cells of neighbouring rows touching at a side or a corner,
 * so no path crosses from the left side to the right one without meeting them; where a row ends short
 * of the cut it gives no cell and stays whole on its side. Both sides are blocks again, with the cut's
 * shape as their new ends, and the cut takes its (at most 4) labels above both. Each time the length
 * doubles the height grows by one middle cut; what the jagged ends buy is lower heights for the blocks
 * at the bottom of the recursion. A dynamic program over (rows, left end, right end, length), up to
 * mirror images, chooses every cut's shape and position; blocks of at most 16 cells are ranked
 * optimally by exact search (TreeDepthSearch), one-row blocks as paths.
 */
export class FourRowDoubling {
  private readonly values = new Map<number, number>();
  /** The chosen cut per block (profile index * 2^24 + position + 2^23), or a LEAF_ kind. */
  private readonly moves = new Map<number, number>();
  private readonly from = new Int32Array(4);
  private readonly to = new Int32Array(4);

  /**
   * @param fullSearchLength blocks up to this length try every cut position; longer ones the positions
   *   within `window` of the middle (both sides then have about half the length).
   */
  constructor(
    private readonly fullSearchLength = 12,
    private readonly window = 1,
  ) {}

  /** The number of labels the construction uses on the 4 x n grid. */
  value(n: number): number {
    checkLength(n);
    return this.solve(4, 0, 0, n);
  }

  /** The ranking of the 4 x n grid (row-major labels, as gridGraph numbers vertices). */
  ranking(n: number): UpperBound {
    checkLength(n);
    const labels = new Int32Array(4 * n);
    const value = this.label(4, 0, 0, n, { row: 0, rowSign: 1, col: 0, colSign: 1 }, (r, c, label) => {
      labels[r * n + c] = label;
    });
    return {
      value,
      labels,
      construction: 'four-row-doubling',
      argument: `split the 4 x ${n} grid by middle cut sets of one cell per row, recursively, choosing each cut's shape by dynamic programming; each cut takes its labels above both sides; blocks of at most 16 cells are ranked by exact search (${value} labels)`,
    };
  }

  /** The ranking of a 4 x n or an n x 4 grid, in that grid's own row-major numbering. */
  gridRanking(rows: number, cols: number): UpperBound {
    if (rows !== 4 && cols !== 4) throw new SizeError(`four-row doubling needs 4 rows or 4 columns, got ${rows} x ${cols}`);
    if (rows === 4) return this.ranking(cols);
    const bound = this.ranking(rows);
    // An n x 4 grid is the 4 x n one turned: its cell (r, c) is cell (c, r) there.
    const labels = new Int32Array(rows * 4);
    for (let r = 0; r < rows; r++) for (let c = 0; c < 4; c++) labels[r * 4 + c] = bound.labels[c * rows + r]!;
    return { ...bound, labels };
  }

  /** The height of a block, solving it on first sight. */
  private solve(rows: number, p: number, q: number, length: number): number {
    const known = this.values.get(canonical(rows, p, q, length).key);
    if (known !== undefined) return known;
    const c = { ...image }; // the shared image is overwritten by the recursion
    if (rows === 1) return this.store(c.key, floorLog2(length) + 1, LEAF_PATH);
    if (cellsOf(rows, c.p, c.q, length) <= LEAF_CELLS) return this.store(c.key, this.leaf(rows, c.p, c.q, length).value, LEAF_EXACT);
    let best = Infinity;
    let bestMove = 0;
    const profiles = PROFILES[rows]!;
    for (let i = 0; i < profiles.length; i++) {
      const delta = profiles[i]!;
      // Row r's cut column k + delta_r lies in the row or just past one of its ends.
      let from = -Infinity;
      let to = Infinity;
      let highest = 0;
      for (let r = 0; r < rows; r++) {
        from = Math.max(from, digit(c.p, r) - 1 - digit(delta, r));
        to = Math.min(to, length - digit(c.q, r) - digit(delta, r));
        highest = Math.max(highest, digit(delta, r));
      }
      if (length > this.fullSearchLength) {
        const middle = Math.floor((length - 1 - highest) / 2);
        from = Math.max(from, middle - this.window);
        to = Math.min(to, middle + this.window);
      }
      for (let k = from; k <= to; k++) {
        const v = this.cutValue(rows, c.p, c.q, length, delta, k);
        if (v < best) {
          best = v;
          bestMove = i * 16_777_216 + k + 8_388_608;
        }
      }
    }
    // Should no cut fit (none does on any block seen so far), search is still exact, only slower.
    if (best === Infinity) return this.store(c.key, this.leaf(rows, c.p, c.q, length).value, LEAF_EXACT);
    return this.store(c.key, best, bestMove);
  }

  private store(key: number, value: number, move: number): number {
    this.values.set(key, value);
    this.moves.set(key, move);
    return value;
  }

  /** Cut cells (in the block) plus the higher side, for the cut at columns k + delta_r; Infinity if not allowed. */
  private cutValue(rows: number, p: number, q: number, length: number, delta: number, k: number): number {
    const { from, to } = this;
    let cells = 0;
    for (let r = 0; r < rows; r++) {
      const cut = k + digit(delta, r);
      if (cut >= digit(p, r) && cut <= length - 1 - digit(q, r)) cells++;
    }
    if (cells === 0) return Infinity; // only blocks in pieces could be split for free; ours are connected
    for (let r = 0; r < rows; r++) {
      from[r] = digit(p, r);
      to[r] = Math.min(length - 1 - digit(q, r), k + digit(delta, r) - 1);
    }
    const left = sideOf(rows, from, to);
    if (left === undefined) return Infinity;
    for (let r = 0; r < rows; r++) {
      from[r] = Math.max(digit(p, r), k + digit(delta, r) + 1);
      to[r] = length - 1 - digit(q, r);
    }
    const right = sideOf(rows, from, to);
    if (right === undefined || (!left && !right)) return Infinity;
    const l = left ? this.solve(left.rows, left.p, left.q, left.length) : 0;
    const rt = right ? this.solve(right.rows, right.p, right.q, right.length) : 0;
    return cells + Math.max(l, rt);
  }

  /** An optimal ranking of a small block by exact search, labels by local cell r * length + column. */
  private leaf(rows: number, p: number, q: number, length: number): { value: number; labels: Int32Array } {
    const key = keyOf(rows, p, q, length);
    const known = exactLeaves.get(key);
    if (known) return known;
    const present = new Uint8Array(rows * length);
    for (let r = 0; r < rows; r++) for (let y = digit(p, r); y <= length - 1 - digit(q, r); y++) present[r * length + y] = 1;
    const g = maskGraph({ rows, cols: length, present });
    const search = new TreeDepthSearch(g);
    const all = Bitset.full(g.vertexCount);
    const value = search.treeDepth(all);
    const found = new Int32Array(g.vertexCount);
    search.label(all, value, found);
    const labels = new Int32Array(rows * length);
    g.layout!.cells.forEach((cell, v) => (labels[cell] = found[v]!));
    const leaf = { value, labels };
    exactLeaves.set(key, leaf);
    return leaf;
  }

  /** Labels a block placed by `at` through put(global row, global column, label); returns its top label. */
  private label(rows: number, p: number, q: number, length: number, at: Placement, put: (r: number, c: number, label: number) => void): number {
    const value = this.solve(rows, p, q, length);
    const c = { ...canonical(rows, p, q, length) };
    // The canonical image's local cell (r, y) is the block's cell (r or R - 1 - r, y or L - 1 - y).
    const lr = (c.mirror & 1) === 1;
    const tb = (c.mirror & 2) === 2;
    const here: Placement = {
      row: at.row + (tb ? at.rowSign * (rows - 1) : 0),
      rowSign: tb ? -at.rowSign : at.rowSign,
      col: at.col + (lr ? at.colSign * (length - 1) : 0),
      colSign: lr ? -at.colSign : at.colSign,
    };
    const place = (r: number, y: number, label: number) => put(here.row + here.rowSign * r, here.col + here.colSign * y, label);
    const move = this.moves.get(c.key)!;
    if (move === LEAF_PATH) {
      for (let y = 0; y < length; y++) place(0, y, 32 - Math.clz32((y + 1) & -(y + 1))); // ruler labels
      return value;
    }
    if (move === LEAF_EXACT) {
      const leaf = this.leaf(rows, c.p, c.q, length);
      for (let r = 0; r < rows; r++) for (let y = digit(c.p, r); y <= length - 1 - digit(c.q, r); y++) place(r, y, leaf.labels[r * length + y]!);
      return value;
    }
    const delta = PROFILES[rows]![Math.floor(move / 16_777_216)]!;
    const k = (move % 16_777_216) - 8_388_608;
    const { from, to } = this;
    let top = 0;
    for (const side of [0, 1]) {
      for (let r = 0; r < rows; r++) {
        const cut = k + digit(delta, r);
        from[r] = side === 0 ? digit(c.p, r) : Math.max(digit(c.p, r), cut + 1);
        to[r] = side === 0 ? Math.min(length - 1 - digit(c.q, r), cut - 1) : length - 1 - digit(c.q, r);
      }
      const s = sideOf(rows, from, to);
      if (!s) continue;
      const within: Placement = { row: here.row + here.rowSign * s.row, rowSign: here.rowSign, col: here.col + here.colSign * s.col, colSign: here.colSign };
      top = Math.max(top, this.label(s.rows, s.p, s.q, s.length, within, put));
    }
    for (let r = 0; r < rows; r++) {
      const cut = k + digit(delta, r);
      if (cut >= digit(c.p, r) && cut <= length - 1 - digit(c.q, r)) place(r, cut, ++top);
    }
    if (top !== value) throw new Error(`four-row doubling: labelled ${top}, expected ${value}`);
    return top;
  }
}

function checkLength(n: number): void {
  if (!Number.isInteger(n) || n < 1) throw new SizeError(`four-row doubling needs a whole length n >= 1, got ${n}`);
  if (n > 1e7) throw new SizeError(`four-row doubling: 4 x ${n} is more cells than it labels`);
}

/** The four-row-doubling upper bound for the 4 x n grid, with its ranking. */
export function fourRowDoublingRanking(n: number): UpperBound {
  return new FourRowDoubling().ranking(n);
}
