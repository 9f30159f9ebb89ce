import type { Graph } from '../graph/graph';
import { vertexPositions } from './vertex-positions';

/** The ranking as a TikZ picture for a paper: one labelled node per vertex, edges for non-grid graphs. */
export function rankingTikz(g: Graph, labels: ArrayLike<number>): string {
  const at = vertexPositions(g);
  const lines = ['% A ranking drawn by Cairn; needs \\usepackage{tikz}.', '\\begin{tikzpicture}[x=0.8cm,y=-0.8cm,every node/.style={draw,minimum size=0.7cm,inner sep=0pt}]'];
  if (!g.layout) for (const [u, v] of g.edges()) lines.push(`  \\draw (${at[u]!.x.toFixed(2)},${at[u]!.y.toFixed(2)}) -- (${at[v]!.x.toFixed(2)},${at[v]!.y.toFixed(2)});`);
  for (let v = 0; v < g.vertexCount; v++) {
    const shape = g.layout ? 'rectangle' : 'circle,fill=white';
    lines.push(`  \\node[${shape}] at (${at[v]!.x.toFixed(2)},${at[v]!.y.toFixed(2)}) {${labels[v]}};`);
  }
  lines.push('\\end{tikzpicture}');
  return `${lines.join('\n')}\n`;
}
