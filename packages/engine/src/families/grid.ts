import type { Graph } from '../graph/graph';
import { latticeGraph } from './lattice';
import { checkCapacity, checkWhole } from './sizes';

/**
 * The grid P_rows x P_cols: vertex r * cols + c is the cell in row r, column c (row-major);
 * rows * cols vertices and 2 * rows * cols - rows - cols edges.
 */
export function gridGraph(rows: number, cols: number): Graph {
  checkWhole('grid', 'rows', rows, 1);
  checkWhole('grid', 'cols', cols, 1);
  checkCapacity(`grid ${rows}x${cols}`, rows * cols, 2 * rows * cols);
  return latticeGraph(rows, cols, false, false, { kind: 'grid', rows, cols });
}
