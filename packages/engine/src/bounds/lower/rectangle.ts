import { CLOSED_FORMS, grid2RankNumber, pathRankNumber } from '../../formulas/closed-forms';
import type { Graph } from '../../graph/graph';
import type { LowerBound } from '../lower-bound';
import { CITE } from './citations';
import { gridShapeOf, type GridShape, type KnownRectangleValues } from './grid-shape';

export interface RectangleOptions {
  /**
   * The largest box of sub-sizes (h x w pairs) the known table is asked over; beyond it only the maximal
   * blocks' own sizes are asked. Default 250,000.
   */
  maxTableQueries?: number;
}

/** The provenance strings of the closed forms a rectangle witness may carry, as formulaFor writes them. */
export const RECTANGLE_PATH_PROVENANCE = `formula:${CLOSED_FORMS.path.id}`;
export const RECTANGLE_GRID2_PROVENANCE = `formula:${CLOSED_FORMS.grid2.id}`;

/** The rank number of the full h x w grid by a closed form, when one is attributed (min side <= 2). */
export function rectangleClosedForm(h: number, w: number): { value: number; provenance: string } | undefined {
  const short = Math.min(h, w);
  const long = Math.max(h, w);
  if (short === 1) return { value: pathRankNumber(long), provenance: RECTANGLE_PATH_PROVENANCE };
  if (short === 2) return { value: grid2RankNumber(long), provenance: RECTANGLE_GRID2_PROVENANCE };
  return undefined;
}

/** A sub-rectangle's size and the value it is known to have. */
interface Valued {
  rows: number;
  cols: number;
  value: number;
  provenance: string;
}

/**
 * The best bound from a full rectangle of cells in a grid shape: a full a x b block carries the grid
 * P_a × P_b as a subgraph, so χr(G) >= χr(P_a × P_b) (td monotone under subgraphs; Nešetřil & Ossona de
 * Mendez, Sparsity, 2012). Values come from the closed forms for a short side of 1 (Bodlaender et al.
 * 1998) or 2 (Alpert, Discrete Math. 2010), and from `known` (asked canonically, rows <= cols) for any
 * size. Every sub-block of a block is a candidate too, since the value only grows with the block.
 *
 * The blocks examined are all maximal ones, by the stack method for the largest rectangle in a binary
 * matrix (per bottom row, column heights of present cells and a stack of increasing heights; common
 * practice), O(rows · cols). Undefined when g has no grid layout whose adjacent cells are joined.
 */
export function rectangleBound(g: Graph, known?: KnownRectangleValues, options: RectangleOptions = {}): LowerBound | undefined {
  const shape = gridShapeOf(g);
  if (!shape || g.vertexCount === 0) return undefined;
  let best: (Valued & { row: number; col: number }) | undefined;
  const consider = (value: number, rows: number, cols: number, provenance: string, row: number, col: number) => {
    // Larger value first; on ties a closed form (checkable without the table), then the larger block.
    const formula = provenance.startsWith('formula:');
    if (best) {
      if (value !== best.value) {
        if (value < best.value) return;
      } else {
        const bestFormula = best.provenance.startsWith('formula:');
        if (formula !== bestFormula ? !formula : rows * cols <= best.rows * best.cols) return;
      }
    }
    best = { value, rows, cols, provenance, row, col };
  };
  const sizes = new Map<number, { h: number; w: number; row: number; col: number }>();
  forEachMaximalBlock(shape, (h, w, row, col) => {
    // Closed forms: the 2 x long (or 1 x long) block at the candidate's corner.
    if (h === 1 || w === 1) consider(pathRankNumber(h * w), h, w, RECTANGLE_PATH_PROVENANCE, row, col);
    else if (w >= h) consider(grid2RankNumber(w), 2, w, RECTANGLE_GRID2_PROVENANCE, row, col);
    else consider(grid2RankNumber(h), h, 2, RECTANGLE_GRID2_PROVENANCE, row, col);
    if (known) {
      const key = h * (shape.cols + 1) + w;
      if (!sizes.has(key)) sizes.set(key, { h, w, row, col });
    }
  });
  let tableNote = '';
  if (known && sizes.size > 0) {
    const table = knownClosure(known, [...sizes.values()], options.maxTableQueries ?? 250_000);
    tableNote = table.note;
    for (const { h, w, row, col } of sizes.values()) {
      const v = table.best(h, w);
      if (v) consider(v.value, v.rows, v.cols, v.provenance, row, col);
    }
  }
  const b = best!;
  const source = b.provenance === RECTANGLE_PATH_PROVENANCE ? CITE.rankings : b.provenance === RECTANGLE_GRID2_PROVENANCE ? CITE.alpert : `the known table (${b.provenance})`;
  return {
    value: b.value,
    witness: { kind: 'rectangle', row: b.row, col: b.col, rows: b.rows, cols: b.cols, value: b.value, provenance: b.provenance },
    argument:
      `the full ${b.rows} x ${b.cols} block of cells at row ${b.row}, column ${b.col} is a grid subgraph with χr = ${b.value} ` +
      `(${source}); χr is monotone under subgraphs (${CITE.sparsity})${tableNote}`,
  };
}

/**
 * Calls fn(h, w, top, left) for every block that cannot grow sideways or upwards (so every maximal
 * block, and some that could still grow downwards): for each bottom row, pop the stack of increasing
 * column heights; the popped height spans from the bar below it in the stack to the current column.
 * A bar popped by one of equal height is skipped: its block grows to the right, and that bar reports it.
 */
export function forEachMaximalBlock(shape: GridShape, fn: (h: number, w: number, top: number, left: number) => void): void {
  const { rows, cols, owner } = shape;
  const height = new Int32Array(cols + 1); // height[cols] stays 0: a sentinel that empties the stack
  const stack = new Int32Array(cols + 1);
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) height[c] = owner[r * cols + c]! >= 0 ? height[c]! + 1 : 0;
    let top = 0;
    for (let c = 0; c <= cols; c++) {
      const hc = height[c]!;
      while (top > 0 && height[stack[top - 1]!]! >= hc) {
        const h = height[stack[--top]!]!;
        const left = top > 0 ? stack[top - 1]! + 1 : 0;
        if (h > hc) fn(h, c - left, r - h + 1, left);
      }
      stack[top++] = c;
    }
  }
}

/**
 * The best table value over sub-blocks: best(h, w) = max over a <= h, b <= w of known(min, max), by a
 * dynamic program over the box of all asked sizes when that box is small enough, else asking only the
 * candidates' own sizes (then it says so).
 */
function knownClosure(known: KnownRectangleValues, sizes: { h: number; w: number }[], maxQueries: number): { best: (h: number, w: number) => Valued | undefined; note: string } {
  const memo = new Map<number, Valued | undefined>();
  const ask = (a: number, b: number): Valued | undefined => {
    const lo = Math.min(a, b);
    const hi = Math.max(a, b);
    const key = lo * 0x100000 + hi;
    if (!memo.has(key)) {
      const k = known(lo, hi);
      memo.set(key, k ? { rows: lo, cols: hi, value: k.value, provenance: k.provenance } : undefined);
    }
    const k = memo.get(key);
    // The table answers canonically; the block keeps the asked orientation.
    return k && { ...k, rows: a, cols: b };
  };
  let maxH = 0;
  let maxW = 0;
  for (const s of sizes) {
    maxH = Math.max(maxH, s.h);
    maxW = Math.max(maxW, s.w);
  }
  if (maxH * maxW > maxQueries) {
    return { best: (h, w) => ask(h, w), note: `; the table was asked only about the ${sizes.length} maximal block sizes (the box of all sub-sizes exceeds ${maxQueries})` };
  }
  const box: (Valued | undefined)[] = new Array((maxH + 1) * (maxW + 1));
  const at = (h: number, w: number) => h * (maxW + 1) + w;
  for (let h = 1; h <= maxH; h++) {
    for (let w = 1; w <= maxW; w++) {
      let v = ask(h, w);
      for (const prev of [box[at(h - 1, w)], box[at(h, w - 1)]]) if (prev && (!v || prev.value > v.value)) v = prev;
      box[at(h, w)] = v;
    }
  }
  return { best: (h, w) => box[at(h, w)], note: '' };
}
