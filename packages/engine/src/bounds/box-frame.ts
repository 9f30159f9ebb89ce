import type { Box } from './bevelled-box';

/**
 * The canonical frame of a bevelled box: of its 8 images under the symmetries of the square, translated
 * to start at (0, 0), the least by (height, width, corner bevels) (DESIGN: memoise a shape on its
 * canonical form, so every copy of a sub-shape anywhere is solved once). A frame maps cells and cut
 * lines between the box and its canonical image.
 */
export interface BoxFrame {
  /** Canonical height, width and the bevels at the top-left, top-right, bottom-right and bottom-left corners. */
  h: number;
  w: number;
  bevels: [number, number, number, number];
  /** Canonical cell index X * w + Y of the box's cell (x, y). */
  cellIndex(x: number, y: number): number;
  /** The box's line (kind, value) that is the canonical line of kind f and value k. */
  lineFrom(f: number, k: number): [number, number];
}

// A symmetry in box-relative coordinates u = x - x0, v = y - y0: X = a u + b v + c, Y = p u + q v + r.
interface Affine {
  a: number;
  b: number;
  c: number;
  p: number;
  q: number;
  r: number;
  h: number;
  w: number;
}

/** Symmetry g of an h x w box: g >> 1 quarter turns clockwise, then a mirror when g is odd. */
function symmetry(h: number, w: number, g: number): Affine {
  let t: Affine = { a: 1, b: 0, c: 0, p: 0, q: 1, r: 0, h, w };
  // A quarter turn clockwise: (X, Y) -> (Y, h - 1 - X), and the box's sides swap.
  for (let turn = 0; turn < g >> 1; turn++) t = { a: t.p, b: t.q, c: t.r, p: -t.a, q: -t.b, r: t.h - 1 - t.c, h: t.w, w: t.h };
  // Mirror the columns: Y -> w - 1 - Y.
  if (g & 1) t = { ...t, p: -t.p, q: -t.q, r: t.w - 1 - t.r };
  return t;
}

/** The range of alpha u + beta v over a tight box, (alpha, beta) one of the 8 signed line kinds. */
function rangeOf(b: Box, alpha: number, beta: number): [number, number] {
  const x0 = b[0]!, y0 = b[2]!;
  const kind = alpha === 0 ? 1 : beta === 0 ? 0 : alpha === beta ? 2 : 3;
  const sign = kind === 0 ? alpha : kind === 1 ? beta : alpha;
  // Shift to box-relative coordinates: u + v = s - x0 - y0, u - v = d - x0 + y0.
  const shift = [x0, y0, x0 + y0, x0 - y0][kind]!;
  const lo = b[2 * kind]! - shift;
  const hi = b[2 * kind + 1]! - shift;
  return sign > 0 ? [lo, hi] : [-hi, -lo];
}

/** Whether (a..f) comes before the key in `q`, lexicographically. */
function less6(a: number, b: number, c: number, d: number, e: number, f: number, q: Int32Array): boolean {
  if (a !== q[0]) return a < q[0]!;
  if (b !== q[1]) return b < q[1]!;
  if (c !== q[2]) return c < q[2]!;
  if (d !== q[3]) return d < q[3]!;
  if (e !== q[4]) return e < q[4]!;
  return f < q[5]!;
}

/**
 * The canonical key of a tight box into out: [height, width, bevel top-left, top-right, bottom-right,
 * bottom-left]; returns which symmetry gives it (index 2r + m: r quarter turns clockwise, then a mirror
 * when m = 1, as symmetry() numbers them). The symmetries only permute the corners (a quarter turn moves
 * each corner's bevel to the next corner clockwise and swaps the sides; a mirror swaps left and right),
 * so this needs no coordinates: it is the fast path of every memo look-up.
 */
export function canonicalKey(b: Box, out: Int32Array): number {
  const h = b[1]! - b[0]! + 1;
  const w = b[3]! - b[2]! + 1;
  const corners = [b[4]! - b[0]! - b[2]!, b[6]! - b[0]! + b[3]!, b[1]! + b[3]! - b[5]!, b[1]! - b[2]! - b[7]!];
  let bestG = -1;
  for (let r = 0; r < 4; r++) {
    const H = r & 1 ? w : h;
    const W = r & 1 ? h : w;
    if (bestG >= 0 && H > out[0]!) continue;
    // After r quarter turns the corner now at position i held corners[(i - r) mod 4].
    const c0 = corners[(4 - r) & 3]!;
    const c1 = corners[(5 - r) & 3]!;
    const c2 = corners[(6 - r) & 3]!;
    const c3 = corners[(7 - r) & 3]!;
    for (let m = 0; m < 2; m++) {
      const k2 = m ? c1 : c0;
      const k3 = m ? c0 : c1;
      const k4 = m ? c3 : c2;
      const k5 = m ? c2 : c3;
      if (bestG >= 0 && !less6(H, W, k2, k3, k4, k5, out)) continue;
      out[0] = H;
      out[1] = W;
      out[2] = k2;
      out[3] = k3;
      out[4] = k4;
      out[5] = k5;
      bestG = 2 * r + m;
    }
  }
  return bestG;
}

/** The frame of a tight box under symmetry g (as numbered by canonicalKey). */
export function frameOf(b: Box, g: number): BoxFrame {
  const h = b[1]! - b[0]! + 1;
  const w = b[3]! - b[2]! + 1;
  const t = symmetry(h, w, g);
  const [S0, S1] = rangeOf(b, t.a + t.p, t.b + t.q);
  const [D0, D1] = rangeOf(b, t.a - t.p, t.b - t.q);
  // The image lies in [0, t.h) x [0, t.w) (tight boxes touch every side), so its bevels follow from
  // the ranges of X + Y and X - Y.
  const cs = t.c + t.r;
  const cd = t.c - t.r;
  const bevels: [number, number, number, number] = [S0 + cs, D0 + cd + (t.w - 1), t.h + t.w - 2 - (S1 + cs), t.h - 1 - (D1 + cd)];
  const x0 = b[0]!;
  const y0 = b[2]!;
  return {
    h: t.h,
    w: t.w,
    bevels,
    cellIndex: (x, y) => {
      const u = x - x0;
      const v = y - y0;
      return (t.a * u + t.b * v + t.c) * t.w + (t.p * u + t.q * v + t.r);
    },
    lineFrom: (f, k) => {
      // The canonical functional as alpha u + beta v + gamma.
      const alpha = f === 0 ? t.a : f === 1 ? t.p : f === 2 ? t.a + t.p : t.a - t.p;
      const beta = f === 0 ? t.b : f === 1 ? t.q : f === 2 ? t.b + t.q : t.b - t.q;
      const gamma = f === 0 ? t.c : f === 1 ? t.r : f === 2 ? t.c + t.r : t.c - t.r;
      const kind = alpha === 0 ? 1 : beta === 0 ? 0 : alpha === beta ? 2 : 3;
      const sign = kind === 0 ? alpha : kind === 1 ? beta : alpha;
      // alpha (x - x0) + beta (y - y0) = k - gamma, and alpha x + beta y = sign * (value of line kind).
      const value = k - gamma + alpha * x0 + beta * y0;
      return [kind, sign * value];
    },
  };
}

/** The canonical box of a key [h, w, bevels top-left, top-right, bottom-right, bottom-left]. */
export function boxOfKey(key: ArrayLike<number>): Box {
  const h = key[0]!;
  const w = key[1]!;
  return [0, h - 1, 0, w - 1, key[2]!, h + w - 2 - key[4]!, key[3]! - (w - 1), h - 1 - key[5]!];
}
