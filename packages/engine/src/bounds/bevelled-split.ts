import { floorLog2 } from '../formulas/closed-forms';
import { SizeError } from '../errors';
import { forEachOnLine, lineCount, rectangleBox, ROW, split, tighten, type Box } from './bevelled-box';
import { BoxMemo } from './box-memo';
import { boxOfKey, canonicalKey, frameOf } from './box-frame';
import type { UpperBound } from './upper-bound';

const LEAF_SPREAD = 1; // cells no two of which touch (one cell, or cells along one diagonal): label 1
const LEAF_PATH = 2; // one row: the ruler labelling of a path
const CUT = 4; // CUT + f: cut the canonical line of kind f

/** Tuning of the search; the defaults meet the engine's speed targets (bench/). */
export interface BevelledSplitOptions {
  /**
   * Boxes up to this many rows and columns try cut positions around the balance point on every line
   * kind; larger ones take the move of their scaled-down image (see BevelledSplit).
   */
  fullSearchExtent?: number;
  /** Positions tried on each side of the balance point. */
  window?: number;
  /** Boxes up to this extent try `window` positions on each side; larger ones only the balance point. */
  windowExtent?: number;
  /** Positions tried on each side of the position lifted from the scaled-down image. */
  liftWindow?: number;
}

/** A box's move: its number of labels, and the line it cuts (kind, value in the box's own coordinates). */
export interface BoxMove {
  value: number;
  /** [line kind, value]; null for a leaf (a path, or cells no two of which touch). */
  line: [number, number] | null;
}

/**
 * Separator recursion over bevelled boxes (Cairn's own construction): cut a box along one row, column or
 * diagonal, rank the two sides, and give the cut cells distinct labels above both (td(G) <= |S| +
 * max td(G - S) for any vertex set S; Nešetřil & Ossona de Mendez, Sparsity, 2012). Both sides are
 * bevelled boxes again, so a dynamic program over canonical boxes (memoised up to the 8 symmetries)
 * chooses every cut. Heights come first; a ranking is built once at the end from the recorded moves.
 *
 * Small boxes try each line kind at the positions around where the two sides' heights cross (found by
 * bisection: one side only grows and the other only shrinks as the line moves), within `window`. A box
 * more than `fullSearchExtent` across takes the move its image scaled down to that extent takes, tries
 * `liftWindow` positions around it, and recurses: heights grow about linearly with the side, so the
 * image's choice is close to the box's own, and only a few large boxes are ever solved.
 */
export class BevelledSplit {
  private readonly memo = new BoxMemo(14);
  private readonly key = new Int32Array(6);
  private readonly tables: Int32Array[] = [];
  private readonly fullSearchExtent: number;
  private readonly window: number;
  private readonly windowExtent: number;
  private readonly liftWindow: number;

  constructor(options: BevelledSplitOptions = {}) {
    this.fullSearchExtent = options.fullSearchExtent ?? 16;
    this.window = options.window ?? 1;
    this.windowExtent = options.windowExtent ?? 12;
    this.liftWindow = options.liftWindow ?? 0;
  }

  /** How many boxes the program has solved (for the benchmarks' reports). */
  get solved(): number {
    return this.memo.size;
  }

  /** The number of labels the construction uses on box b (0 for an empty box). */
  value(b: Box | null): number {
    const t = b && tighten(b);
    return t ? this.valueOfTight(t) : 0;
  }

  /** The construction's move on box b, or null when b holds no cell. */
  move(b: Box | null): BoxMove | null {
    const t = b && tighten(b);
    if (!t) return null;
    const value = this.valueOfTight(t);
    const g = canonicalKey(t, this.key);
    const slot = this.memo.find(this.key);
    const kind = this.memo.kind(slot);
    if (kind < CUT) return { value, line: null };
    return { value, line: frameOf(t, g).lineFrom(kind - CUT, this.memo.line(slot)) };
  }

  /**
   * Labels every cell of box b through put(x, y, label) with labels 1..value and returns the value.
   * The labels are a ranking of the cells' grid graph: each cut takes labels above both its sides.
   */
  label(b: Box | null, put: (x: number, y: number, label: number) => void): number {
    const t = b && tighten(b);
    if (!t) return 0;
    const value = this.valueOfTight(t);
    const g = canonicalKey(t, this.key);
    if (Math.max(t[1]! - t[0]!, t[3]! - t[2]!) < this.fullSearchExtent) {
      // Small boxes are the bulk of the pieces: copy their canonical labelling, made once per shape.
      const table = this.tableOf(this.key);
      const frame = frameOf(t, g);
      for (let x = t[0]!; x <= t[1]!; x++) forEachOnLine(t, ROW, x, (i, j) => put(i, j, table[frame.cellIndex(i, j)]!));
      return value;
    }
    const slot = this.memo.find(this.key);
    return this.labelMove(t, this.memo.kind(slot), frameOf(t, g).lineFrom(this.memo.kind(slot) - CUT, this.memo.line(slot)), value, put);
  }

  /** Carries out one move on a tight box (a leaf's labelling, or a cut and both sides); returns the top label. */
  private labelMove(t: Box, kind: number, line: [number, number], value: number, put: (x: number, y: number, label: number) => void): number {
    if (kind === LEAF_SPREAD) {
      for (let x = t[0]!; x <= t[1]!; x++) forEachOnLine(t, ROW, x, (i, j) => put(i, j, 1));
      return 1;
    }
    if (kind === LEAF_PATH) {
      // One row or one column: the ruler labelling, 1 + the trailing zero bits of the position.
      const alongRow = t[0] === t[1];
      const from = alongRow ? t[2]! : t[0]!;
      const to = alongRow ? t[3]! : t[1]!;
      for (let i = from; i <= to; i++) {
        const p = i - from + 1;
        const label = 32 - Math.clz32(p & -p);
        if (alongRow) put(t[0]!, i, label);
        else put(i, t[2]!, label);
      }
      return value;
    }
    const [f, k] = line;
    const [below, above] = split(t, f, k);
    let top = Math.max(this.label(below, put), this.label(above, put));
    forEachOnLine(t, f, k, (x, y) => put(x, y, ++top));
    return top;
  }

  /** The labelling of a solved small canonical box, cell X * w + Y of its frame; made on first use. */
  private tableOf(key: Int32Array): Int32Array {
    let slot = this.memo.find(key);
    const known = this.memo.extra(slot);
    if (known >= 0) return this.tables[known]!;
    const own = key.slice();
    const c = boxOfKey(own);
    const w = own[1]!;
    const table = new Int32Array(own[0]! * w);
    const kind = this.memo.kind(slot);
    this.labelMove(c, kind, kind >= CUT ? [kind - CUT, this.memo.line(slot)] : [0, 0], this.memo.value(slot), (x, y, label) => {
      table[x * w + y] = label;
    });
    slot = this.memo.find(own); // the look-ups above may have moved it
    this.memo.setExtra(slot, this.tables.length);
    this.tables.push(table);
    return table;
  }

  /** The bevelled split of the whole rows x cols rectangle, as a ranking of gridGraph(rows, cols). */
  rectangleRanking(rows: number, cols: number): UpperBound {
    if (!Number.isInteger(rows) || !Number.isInteger(cols) || rows < 1 || cols < 1) throw new SizeError(`the bevelled split needs a grid of whole sizes >= 1, got ${rows} x ${cols}`);
    if (rows * cols > 1e8) throw new SizeError(`the bevelled split: ${rows} x ${cols} is more cells than it labels (10^8)`);
    const labels = new Int32Array(rows * cols);
    const value = this.label(rectangleBox(rows, cols), (x, y, label) => {
      labels[x * cols + y] = label;
    });
    return {
      value,
      labels,
      construction: 'bevelled-split',
      argument: `cut the ${rows} x ${cols} rectangle and each piece left along the row, column or diagonal chosen by dynamic programming; each cut takes distinct labels above the pieces it separates (${value} labels)`,
    };
  }

  /** The value of a tight box: a memo look-up by its canonical key, solving it on a miss. */
  private valueOfTight(t: Box): number {
    canonicalKey(t, this.key);
    const slot = this.memo.find(this.key);
    if (this.memo.has(slot)) return this.memo.value(slot);
    const key = this.key.slice(); // the scratch key is overwritten by the recursion
    return this.decide(boxOfKey(key), key);
  }

  /** Solves a canonical box c (not in the memo yet), stores its move under key; returns its value. */
  private decide(c: Box, key: Int32Array): number {
    const h = key[0]!;
    const w = key[1]!;
    if (c[4] === c[5] || c[6] === c[7]) return this.store(key, 1, LEAF_SPREAD, 0);
    if (h === 1) return this.store(key, floorLog2(w) + 1, LEAF_PATH, 0);
    let best = Infinity;
    let bestKind = -1;
    let bestLine = 0;
    const tryCut = (f: number, k: number) => {
      const [below, above] = split(c, f, k);
      const v = lineCount(c, f, k) + Math.max(below ? this.valueOfTight(below) : 0, above ? this.valueOfTight(above) : 0);
      if (v < best) {
        best = v;
        bestKind = f;
        bestLine = k;
      }
    };
    if (Math.max(h, w) <= this.fullSearchExtent) {
      for (let f = 0; f < 4; f++) {
        const lo = c[2 * f]!;
        const hi = c[2 * f + 1]!;
        const a = this.balance(c, f, lo, hi);
        const reach = Math.max(h, w) <= this.windowExtent ? this.window : 0;
        for (let k = Math.max(lo, a - reach); k <= Math.min(hi, a + reach); k++) tryCut(f, k);
      }
    } else {
      const [f, fraction] = this.liftedMove(c, h, w);
      const lo = c[2 * f]!;
      const hi = c[2 * f + 1]!;
      const k0 = Math.round(lo + fraction * (hi - lo));
      for (let k = Math.max(lo, k0 - this.liftWindow); k <= Math.min(hi, k0 + this.liftWindow); k++) tryCut(f, k);
    }
    return this.store(key, best, CUT + bestKind, bestLine);
  }

  private store(key: Int32Array, value: number, kind: number, line: number): number {
    this.memo.set(key, value, kind, line);
    return value;
  }

  /** The least k in [lo, hi] at which the side below the line is at least as high as the side above. */
  private balance(c: Box, f: number, lo: number, hi: number): number {
    let a = lo;
    let z = hi;
    while (a < z) {
      const mid = (a + z) >> 1;
      const [below, above] = split(c, f, mid);
      if ((below ? this.valueOfTight(below) : 0) >= (above ? this.valueOfTight(above) : 0)) z = mid;
      else a = mid + 1;
    }
    return a;
  }

  /**
   * The move of c's image scaled down to fullSearchExtent across: its line kind, and where on that kind's
   * range it cuts (0 the lowest value, 1 the highest). An image too thin to have a move (one row, or
   * one diagonal) says: cut the longer side in the middle.
   */
  private liftedMove(c: Box, h: number, w: number): [number, number] {
    // Corner (0, 0) stays put and the far side lands on fullSearchExtent - 1, so the image is small.
    const scale = (this.fullSearchExtent - 1) / (Math.max(h, w) - 1);
    const image = tighten(c.map((v) => Math.round(v * scale)));
    const m = image && this.move(image);
    if (!image || !m || !m.line) return [h > w ? 0 : 1, 0.5];
    const [f, k] = m.line;
    const lo = image[2 * f]!;
    const hi = image[2 * f + 1]!;
    return [f, hi > lo ? (k - lo) / (hi - lo) : 0.5];
  }
}
