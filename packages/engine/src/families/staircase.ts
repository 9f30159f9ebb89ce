import type { Graph } from '../graph/graph';
import { shapeGraph } from './mask';
import { checkCapacity, checkWhole } from './sizes';

/**
 * The staircase S(t): the cells (i, j), i, j >= 0, with i + j < t, in a t x t box, numbered row-major
 * (row i holds t - i cells). t(t + 1) / 2 vertices and t(t - 1) edges: row i has t - i - 1 horizontal
 * edges, and column j likewise t - j - 1 vertical ones, each summing to t(t - 1) / 2.
 */
export function staircaseGraph(t: number): Graph {
  checkWhole('staircase', 't', t, 1);
  checkCapacity(`staircase ${t}`, (t * (t + 1)) / 2, t * (t - 1));
  const present = new Uint8Array(t * t);
  for (let i = 0; i < t; i++) for (let j = 0; i + j < t; j++) present[i * t + j] = 1;
  return shapeGraph({ rows: t, cols: t, present }, { kind: 'staircase', t });
}
