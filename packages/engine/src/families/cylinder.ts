import type { Graph } from '../graph/graph';
import { latticeGraph } from './lattice';
import { checkCapacity, checkWhole } from './sizes';

/**
 * The cylinder P_rows x C_cols (Cartesian product of a path and a cycle): the grid with each row closed
 * into a cycle, so column cols - 1 touches column 0. Vertex r * cols + c; cols >= 3 keeps it simple.
 * rows * cols vertices and 2 * rows * cols - cols edges.
 */
export function cylinderGraph(rows: number, cols: number): Graph {
  checkWhole('cylinder', 'rows', rows, 1);
  checkWhole('cylinder', 'cols (the length of each cycle)', cols, 3);
  checkCapacity(`cylinder ${rows}x${cols}`, rows * cols, 2 * rows * cols);
  return latticeGraph(rows, cols, false, true, { kind: 'cylinder', rows, cols });
}
