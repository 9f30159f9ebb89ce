/**
 * What a graph was built as, so later modules (formulas, bounds, exact search, drawing) can recognise
 * it. Grid-like families number vertices row-major; see each builder for its numbering.
 */
export type Family =
  | { kind: 'grid'; rows: number; cols: number }
  | { kind: 'mask'; rows: number; cols: number; text: string }
  | { kind: 'staircase'; t: number }
  | { kind: 'cylinder'; rows: number; cols: number }
  | { kind: 'torus'; rows: number; cols: number }
  | { kind: 'path'; n: number }
  | { kind: 'cycle'; n: number }
  | { kind: 'complete'; n: number }
  | { kind: 'completeBipartite'; a: number; b: number }
  | { kind: 'star'; leaves: number }
  | { kind: 'tree'; n: number }
  | { kind: 'randomTree'; n: number; seed: number }
  | { kind: 'randomGraph'; n: number; p: number; seed: number }
  | { kind: 'file'; format: string; name?: string };

/**
 * Where each vertex of a grid-like graph sits: vertex v is the cell (row, col) with
 * cells[v] = row * cols + col. Grids, masks, staircases, cylinders and tori carry one.
 */
export interface GridLayout {
  rows: number;
  cols: number;
  cells: Int32Array;
}

/** A mask's cells before it becomes a graph: present[r * cols + c] is 1 for a cell, 0 for a hole. */
export interface MaskShape {
  rows: number;
  cols: number;
  present: Uint8Array;
}
