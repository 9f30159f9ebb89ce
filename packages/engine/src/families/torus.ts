import type { Graph } from '../graph/graph';
import { latticeGraph } from './lattice';
import { checkCapacity, checkWhole } from './sizes';

/**
 * The torus C_rows x C_cols: the grid with rows and columns both closed into cycles. Vertex
 * r * cols + c; rows, cols >= 3 keep it simple. rows * cols vertices and 2 * rows * cols edges.
 */
export function torusGraph(rows: number, cols: number): Graph {
  checkWhole('torus', 'rows', rows, 3);
  checkWhole('torus', 'cols', cols, 3);
  checkCapacity(`torus ${rows}x${cols}`, rows * cols, 2 * rows * cols);
  return latticeGraph(rows, cols, true, true, { kind: 'torus', rows, cols });
}
