import { SizeError } from '../errors';
import type { Family, GridLayout, MaskShape } from '../graph/family';
import { Graph } from '../graph/graph';
import { checkCapacity } from './sizes';

/**
 * The graph of a mask's present cells, joined when they share a side. Present cells are numbered
 * row-major: vertex v is the v-th '#' reading the rows top to bottom, each left to right; layout.cells
 * gives its cell r * cols + c.
 */
export function shapeGraph(shape: MaskShape, family: Family): Graph {
  const { rows, cols, present } = shape;
  if (present.length !== rows * cols) throw new SizeError(`mask: expected ${rows * cols} cells, got ${present.length}`);
  checkCapacity('mask', rows * cols, 2 * rows * cols);
  const index = new Int32Array(rows * cols).fill(-1);
  let n = 0;
  for (let i = 0; i < present.length; i++) if (present[i]) index[i] = n++;
  if (n === 0) throw new SizeError('mask: it has no cells');
  const cells = new Int32Array(n);
  const offsets = new Uint32Array(n + 1);
  const targets = new Uint32Array(4 * n);
  let w = 0;
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      const cell = r * cols + c;
      const v = index[cell]!;
      if (v < 0) continue;
      cells[v] = cell;
      offsets[v] = w;
      // Up, left, right, down: already ascending in row-major numbering.
      if (r > 0 && index[cell - cols]! >= 0) targets[w++] = index[cell - cols]!;
      if (c > 0 && index[cell - 1]! >= 0) targets[w++] = index[cell - 1]!;
      if (c < cols - 1 && index[cell + 1]! >= 0) targets[w++] = index[cell + 1]!;
      if (r < rows - 1 && index[cell + cols]! >= 0) targets[w++] = index[cell + cols]!;
    }
  }
  offsets[n] = w;
  const layout: GridLayout = { rows, cols, cells };
  return new Graph(offsets, targets.slice(0, w), family, layout);
}

/** A mask graph from its shape; the family keeps the mask's text form so it can be recognised and redrawn. */
export function maskGraph(shape: MaskShape): Graph {
  let text = '';
  for (let r = 0; r < shape.rows; r++) {
    for (let c = 0; c < shape.cols; c++) text += shape.present[r * shape.cols + c] ? '#' : '.';
    text += '\n';
  }
  return shapeGraph(shape, { kind: 'mask', rows: shape.rows, cols: shape.cols, text });
}
