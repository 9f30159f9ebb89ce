import type { Graph } from '../graph/graph';
import { normalizeLabels } from '../ranking/normalize';
import { boundOfRanking, type UpperBound } from './upper-bound';

/**
 * For a mask or a staircase: the best ranking of its whole bounding grid (`rankGrid`: the full-grid
 * constructions, labels row-major), kept on the cells that are present and renumbered 1 .. k in order. The shape is an
 * induced subgraph of that grid (its edges are exactly the side adjacencies of its cells), and a ranking
 * stays a ranking on an induced subgraph: a path between two equal labels inside the shape is one in the
 * grid, which passes a larger label (common practice). Undefined for other graphs.
 */
export function boxRestrictionRanking(g: Graph, rankGrid: (rows: number, cols: number) => UpperBound): UpperBound | undefined {
  const kind = g.family?.kind;
  const layout = g.layout;
  if ((kind !== 'mask' && kind !== 'staircase') || !layout || g.vertexCount === 0) return undefined;
  const { rows, cols, cells } = layout;
  const whole = rankGrid(rows, cols); // row-major, as the layout's cells: cell r * cols + c
  const kept = new Int32Array(g.vertexCount);
  for (let v = 0; v < kept.length; v++) kept[v] = whole.labels[cells[v]!]!;
  return boundOfRanking(
    normalizeLabels(g, kept),
    'box-restriction',
    (value) =>
      `the ${whole.construction} ranking of the whole ${rows} x ${cols} grid (${whole.value} labels) kept on the ${g.vertexCount} cells present and renumbered in order (${value} labels): a ranking stays a ranking on an induced subgraph`,
  );
}
