import type { Graph } from '@cairn/engine';

/** The labels drawn as a grid of cells for grid-like graphs (holes as '.'), or undefined for others. */
export function labelPicture(g: Graph, labels: ArrayLike<number>): string | undefined {
  const layout = g.layout;
  if (!layout) return undefined;
  const cells: string[] = new Array<string>(layout.rows * layout.cols).fill('.');
  let width = 1;
  for (let v = 0; v < g.vertexCount; v++) {
    const text = String(labels[v]);
    cells[layout.cells[v]!] = text;
    width = Math.max(width, text.length);
  }
  const lines: string[] = [];
  for (let r = 0; r < layout.rows; r++) {
    lines.push(cells.slice(r * layout.cols, (r + 1) * layout.cols).map((c) => c.padStart(width)).join(' '));
  }
  return `${lines.join('\n')}\n`;
}
