import { forEachMaximalBlock } from '../bounds/lower/rectangle';
import { gridShapeOf } from '../bounds/lower/grid-shape';
import { Bitset } from '../graph/bitset';
import type { Graph } from '../graph/graph';

/** A full block of cells inside a grid shape: its size and where it sits. */
export interface ContainedRectangle {
  rows: number;
  cols: number;
  /** Its vertices (built on demand: a large shape fits many sizes). */
  cells(): Bitset;
}

/**
 * One full block of each size a x b (3 <= a <= b, as a block of either orientation) that fits inside the
 * grid shape g, other than g itself, smallest first: the sub-rectangles the exact search solves before the
 * whole shape, since each one's value bounds every shape containing it below (td is monotone under
 * subgraphs). Every sub-block of a block fits, so it is enough to know, for each height a, the widest
 * block at least a tall (from the maximal blocks of forEachMaximalBlock) and where it sits. Empty for
 * graphs without a grid layout whose side-adjacent cells are joined.
 */
export function containedRectangles(g: Graph): ContainedRectangle[] {
  const shape = gridShapeOf(g);
  if (!shape) return [];
  const { rows, cols, owner } = shape;
  const n = g.vertexCount;
  // widest[h]: the widest block exactly h tall, then (suffix maximum) at least h tall, with its corner.
  const widest = new Int32Array(rows + 2);
  const top = new Int32Array(rows + 2);
  const left = new Int32Array(rows + 2);
  forEachMaximalBlock(shape, (h, w, r, c) => {
    if (w > widest[h]!) [widest[h], top[h], left[h]] = [w, r, c];
  });
  for (let h = rows - 1; h >= 1; h--) {
    if (widest[h + 1]! > widest[h]!) [widest[h], top[h], left[h]] = [widest[h + 1]!, top[h + 1]!, left[h + 1]!];
  }
  const found = new Map<number, ContainedRectangle>();
  for (let a = 3; a <= rows; a++) {
    for (let b = 3; b <= widest[a]!; b++) {
      if (a * b >= n) break; // the whole shape (or more) is not a sub-rectangle
      const key = Math.min(a, b) * 65536 + Math.max(a, b);
      if (found.has(key)) continue;
      const [r0, c0] = [top[a]!, left[a]!];
      found.set(key, {
        rows: a,
        cols: b,
        cells: () => {
          const set = new Bitset(n);
          for (let r = r0; r < r0 + a; r++) for (let c = c0; c < c0 + b; c++) set.add(owner[r * cols + c]!);
          return set;
        },
      });
    }
  }
  return [...found.values()].sort((p, q) => p.rows * p.cols - q.rows * q.cols || Math.min(p.rows, p.cols) - Math.min(q.rows, q.cols));
}
