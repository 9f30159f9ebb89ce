import { pathRankNumber } from '../../formulas/closed-forms';
import type { Graph } from '../../graph/graph';
import type { LowerBound } from '../lower-bound';
import { CITE } from './citations';
import { gridShapeOf, type GridShape, type KnownStaircaseValues } from './grid-shape';

/**
 * The provenance of the one value a staircase carries without a table: S(t) contains a path on 2t − 1
 * cells (down its first column, then along its first row), so χr(S(t)) >= ⌊log2(2t − 1)⌋ + 1
 * (Bodlaender et al. 1998). That is all that is claimed: no closed form for χr(S(t)) is attributed.
 */
export const STAIRCASE_PATH_PROVENANCE = 'formula:path on 2t-1 cells';

/** The four ways S(t) can sit: its right-angle corner at the top-left, top-right, bottom-left or bottom-right. */
export const STAIRCASE_ORIENTATIONS = [
  { dr: 1, dc: 1 },
  { dr: 1, dc: -1 },
  { dr: -1, dc: 1 },
  { dr: -1, dc: -1 },
] as const;

/**
 * Whether cell (r, c) of the t x t box with top-left (row, col) belongs to S(t) in an orientation: with
 * its corner at the box corner that (dr, dc) points away from, the cells i + j < t, i and j counted from
 * that corner.
 */
export function inStaircase(t: number, row: number, col: number, dr: number, dc: number, r: number, c: number): boolean {
  const i = dr > 0 ? r - row : row + t - 1 - r;
  const j = dc > 0 ? c - col : col + t - 1 - c;
  return i >= 0 && j >= 0 && i + j < t;
}

/**
 * The best bound from a staircase S(t) contained in a grid shape (any of its four orientations): S(t) is
 * then a subgraph, so χr(G) >= χr(S(t)) (Nešetřil & Ossona de Mendez, Sparsity, 2012). χr(S(t)) comes only
 * from `known` (the largest t' <= t it knows, as S(t') lies in S(t)); without an entry, the staircase
 * only gives its path on 2t − 1 cells (STAIRCASE_PATH_PROVENANCE), which a path search usually beats.
 *
 * The largest staircase with its corner at each cell, per orientation, by the recurrence
 * s(r, c) = 1 + min(s(r + dr, c), s(r, c + dc)) for a present cell (S(t) at a corner is the corner cell
 * plus S(t − 1) at each of its two neighbours along the legs), O(rows · cols). χr(S(t)) grows with t,
 * so the largest contained staircase is the only one needed.
 *
 * The witness type has no orientation: (row, col) is the top-left cell of the t x t box, and the
 * checker accepts the witness when any of the four orientations of S(t) in that box is present.
 */
export function staircaseBound(g: Graph, known?: KnownStaircaseValues): LowerBound | undefined {
  const shape = gridShapeOf(g);
  if (!shape || g.vertexCount === 0) return undefined;
  const found = largestStaircase(shape);
  let t = found.t;
  let value = pathRankNumber(2 * found.t - 1);
  let provenance = STAIRCASE_PATH_PROVENANCE;
  if (known) {
    for (let s = found.t; s >= 1; s--) {
      const k = known(s);
      if (k && k.value > value) {
        value = k.value;
        provenance = k.provenance;
        t = s;
      }
    }
  }
  // S(t) for t <= found.t at the same corner and orientation; its box's top-left cell.
  const { dr, dc, r: cr, c: cc } = found;
  const row = dr > 0 ? cr : cr - t + 1;
  const col = dc > 0 ? cc : cc - t + 1;
  const why = provenance === STAIRCASE_PATH_PROVENANCE ? `it contains a path on ${2 * t - 1} cells (${CITE.rankings})` : `the known table (${provenance})`;
  return {
    value,
    witness: { kind: 'staircase', row, col, t, value, provenance },
    argument: `the staircase S(${t}) sits in the t x t box at row ${row}, column ${col}; χr(S(${t})) >= ${value} by ${why}; χr is monotone under subgraphs (${CITE.sparsity})`,
  };
}

/** The largest contained staircase: its size, orientation and right-angle corner (first found on ties). */
export function largestStaircase(shape: GridShape): { t: number; dr: number; dc: number; r: number; c: number } {
  const { rows, cols, owner } = shape;
  const size = new Int32Array(rows * cols);
  let best = { t: 0, dr: 1, dc: 1, r: 0, c: 0 };
  for (const { dr, dc } of STAIRCASE_ORIENTATIONS) {
    // Visit each cell after its neighbours (r + dr, c) and (r, c + dc).
    for (let k = 0; k < rows; k++) {
      const r = dr > 0 ? rows - 1 - k : k;
      for (let m = 0; m < cols; m++) {
        const c = dc > 0 ? cols - 1 - m : m;
        const cell = r * cols + c;
        if (owner[cell]! < 0) {
          size[cell] = 0;
          continue;
        }
        const down = r + dr >= 0 && r + dr < rows ? size[cell + dr * cols]! : 0;
        const side = c + dc >= 0 && c + dc < cols ? size[cell + dc]! : 0;
        const t = 1 + Math.min(down, side);
        size[cell] = t;
        if (t > best.t) best = { t, dr, dc, r, c };
      }
    }
  }
  return best;
}
