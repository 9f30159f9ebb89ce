import type { Graph } from '../graph/graph';

/** Where a drawing puts each vertex, in cell units: grid-like graphs at their cells, others on a circle. */
export interface VertexPosition {
  x: number;
  y: number;
}

/** The vertices as nodes: grid-like graphs at their cells, others on a circle (no layout engine needed). */
export function vertexPositions(g: Graph): VertexPosition[] {
  const layout = g.layout;
  if (layout) return Array.from(layout.cells, (cell) => ({ x: cell % layout.cols, y: Math.floor(cell / layout.cols) }));
  const n = g.vertexCount;
  const r = Math.max(2, n / 6);
  return Array.from({ length: n }, (_, v) => ({ x: r + r * Math.cos((2 * Math.PI * v) / n), y: r + r * Math.sin((2 * Math.PI * v) / n) }));
}
