/**
 * A bevelled box: the grid cells (x, y) (x the row, y the column) with
 *   x0 <= x <= x1,  y0 <= y <= y1,  s0 <= x + y <= s1,  d0 <= x - y <= d1,
 * a rectangle with each corner cut off along a diagonal (Cairn's name). Rectangles, staircases S(t),
 * rectangles with a staircase corner cut off and the pieces left by cuts along rows, columns and both
 * diagonals are all bevelled boxes, and cutting one along any of those four lines leaves two more, so the
 * upper-bound constructions can recurse inside this one family.
 *
 * A box is 8 whole numbers [x0, x1, y0, y1, s0, s1, d0, d1]; line kind f (0 row x, 1 column y,
 * 2 anti-diagonal x + y, 3 diagonal x - y) owns the bounds at 2f and 2f + 1.
 */
export type Box = number[];

export const ROW = 0;
export const COLUMN = 1;
export const ANTI_DIAGONAL = 2;
export const DIAGONAL = 3;

const ceilHalf = (a: number) => Math.floor((a + 1) / 2);
const floorHalf = (a: number) => Math.floor(a / 2);

/**
 * The same cell set with every bound attained by some cell, or null when it holds no cell. Each bound is
 * the exact projection of the integer points (a row x is non-empty exactly when each lower bound on y is
 * at most each upper one), so one pass suffices; when a box lies on one diagonal, the other diagonal's
 * values must share its parity.
 */
export function tighten(b: Box): Box | null {
  const x0 = b[0]!, x1 = b[1]!, y0 = b[2]!, y1 = b[3]!, s0 = b[4]!, s1 = b[5]!, d0 = b[6]!, d1 = b[7]!;
  if (x0 > x1 || y0 > y1 || s0 > s1 || d0 > d1) return null;
  const X0 = Math.max(x0, y0 + d0, s0 - y1, ceilHalf(s0 + d0));
  const X1 = Math.min(x1, s1 - y0, y1 + d1, floorHalf(s1 + d1));
  if (X0 > X1) return null;
  const Y0 = Math.max(y0, x0 - d1, s0 - x1, ceilHalf(s0 - d1));
  const Y1 = Math.min(y1, s1 - x0, x1 - d0, floorHalf(s1 - d0));
  let S0 = Math.max(s0, x0 + y0, 2 * x0 - d1, d0 + 2 * y0);
  let S1 = Math.min(s1, x1 + y1, 2 * y1 + d1, 2 * x1 - d0);
  let D0 = Math.max(d0, x0 - y1, 2 * x0 - s1, s0 - 2 * y1);
  let D1 = Math.min(d1, x1 - y0, s1 - 2 * y0, 2 * x1 - s0);
  // x + y and x - y always share a parity: on a single diagonal line the other coordinate is fixed mod 2.
  if (d0 === d1) {
    if ((S0 - d0) & 1) S0++;
    if ((S1 - d0) & 1) S1--;
  }
  if (s0 === s1) {
    if ((D0 - s0) & 1) D0++;
    if ((D1 - s0) & 1) D1--;
  }
  if (Y0 > Y1 || S0 > S1 || D0 > D1) return null;
  return [X0, X1, Y0, Y1, S0, S1, D0, D1];
}

/** The range of x (inclusive) on the line of kind f and value k inside b, as [from, to]; empty when from > to. */
export function lineSpan(b: Box, f: number, k: number): [number, number] {
  if (k < b[2 * f]! || k > b[2 * f + 1]!) return [0, -1];
  const x0 = b[0]!, x1 = b[1]!, y0 = b[2]!, y1 = b[3]!, s0 = b[4]!, s1 = b[5]!, d0 = b[6]!, d1 = b[7]!;
  switch (f) {
    case ROW: // x = k: the span is of y here
      return [Math.max(y0, s0 - k, k - d1), Math.min(y1, s1 - k, k - d0)];
    case COLUMN: // y = k: the span is of x
      return [Math.max(x0, s0 - k, k + d0), Math.min(x1, s1 - k, k + d1)];
    case ANTI_DIAGONAL: // x + y = k
      return [Math.max(x0, k - y1, ceilHalf(k + d0)), Math.min(x1, k - y0, floorHalf(k + d1))];
    default: // x - y = k
      return [Math.max(x0, y0 + k, ceilHalf(s0 + k)), Math.min(x1, y1 + k, floorHalf(s1 + k))];
  }
}

/** How many cells of b lie on the line of kind f and value k. */
export function lineCount(b: Box, f: number, k: number): number {
  const [a, z] = lineSpan(b, f, k);
  return z >= a ? z - a + 1 : 0;
}

/** Calls visit(x, y) for each cell of b on the line of kind f and value k. */
export function forEachOnLine(b: Box, f: number, k: number, visit: (x: number, y: number) => void): void {
  const [a, z] = lineSpan(b, f, k);
  for (let t = a; t <= z; t++) {
    if (f === ROW) visit(k, t);
    else if (f === COLUMN) visit(t, k);
    else if (f === ANTI_DIAGONAL) visit(t, k - t);
    else visit(t, t - k);
  }
}

/** The number of cells of b (a sum over its rows). */
export function cellCount(b: Box): number {
  let n = 0;
  for (let x = b[0]!; x <= b[1]!; x++) n += lineCount(b, ROW, x);
  return n;
}

/** The two sides of b left by removing the line (f, k): values below k, then above k (either may be null). */
export function split(b: Box, f: number, k: number): [Box | null, Box | null] {
  const below = b.slice();
  below[2 * f + 1] = k - 1;
  const above = b.slice();
  above[2 * f] = k + 1;
  return [tighten(below), tighten(above)];
}

/** The m x n rectangle, rows 0..m-1 and columns 0..n-1. */
export function rectangleBox(m: number, n: number): Box {
  return [0, m - 1, 0, n - 1, 0, m + n - 2, -(n - 1), m - 1];
}

/** The staircase S(t): cells (i, j) with i, j >= 0 and i + j < t. */
export function staircaseBox(t: number): Box {
  return [0, t - 1, 0, t - 1, 0, t - 1, -(t - 1), t - 1];
}
