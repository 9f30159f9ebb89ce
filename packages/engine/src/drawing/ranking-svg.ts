import type { Graph } from '../graph/graph';
import { vertexPositions } from './vertex-positions';

/** Cairn's sequential scale for labels, from pale lichen (low) to deep slate (high), in RGB. */
const LOW = [233, 238, 226];
const HIGH = [31, 45, 43];

function shade(label: number, top: number): string {
  const t = top <= 1 ? 1 : (label - 1) / (top - 1);
  const mix = LOW.map((lo, i) => Math.round(lo + (HIGH[i]! - lo) * t));
  return `rgb(${mix.join(',')})`;
}

/** Text on a cell: dark on light cells, light on dark ones. */
const ink = (label: number, top: number) => (top > 1 && (label - 1) / (top - 1) > 0.55 ? '#f6f3ec' : '#1f2d2b');

/** The ranking as an SVG picture: labelled cells for grid-like graphs, a node-link drawing otherwise. */
export function rankingSvg(g: Graph, labels: ArrayLike<number>): string {
  let top = 1;
  for (let v = 0; v < labels.length; v++) top = Math.max(top, labels[v]!);
  const at = vertexPositions(g);
  const size = 36;
  const pad = 4;
  let maxX = 0;
  let maxY = 0;
  for (const p of at) {
    maxX = Math.max(maxX, p.x);
    maxY = Math.max(maxY, p.y);
  }
  const width = (maxX + 1) * size + 2 * pad;
  const height = (maxY + 1) * size + 2 * pad;
  const parts: string[] = [];
  if (!g.layout) {
    for (const [u, v] of g.edges()) {
      const a = at[u]!;
      const b = at[v]!;
      parts.push(`<line x1="${pad + (a.x + 0.5) * size}" y1="${pad + (a.y + 0.5) * size}" x2="${pad + (b.x + 0.5) * size}" y2="${pad + (b.y + 0.5) * size}" stroke="#8aa39b" stroke-width="1.5"/>`);
    }
  }
  for (let v = 0; v < g.vertexCount; v++) {
    const { x, y } = at[v]!;
    const l = labels[v]!;
    const cx = pad + (x + 0.5) * size;
    const cy = pad + (y + 0.5) * size;
    parts.push(
      g.layout
        ? `<rect x="${pad + x * size}" y="${pad + y * size}" width="${size}" height="${size}" fill="${shade(l, top)}" stroke="#f6f3ec" stroke-width="2"/>`
        : `<circle cx="${cx}" cy="${cy}" r="${size * 0.4}" fill="${shade(l, top)}" stroke="#3f5a55"/>`,
      `<text x="${cx}" y="${cy}" text-anchor="middle" dominant-baseline="central" font-family="sans-serif" font-size="14" fill="${ink(l, top)}">${l}</text>`,
    );
  }
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width.toFixed(0)}" height="${height.toFixed(0)}" viewBox="0 0 ${width.toFixed(1)} ${height.toFixed(1)}">\n${parts.join('\n')}\n</svg>\n`;
}
