// Pictures of a ranking (SVG for screens, TikZ for papers); plain strings, no I/O.
export { rankingSvg } from './ranking-svg';
export { rankingTikz } from './ranking-tikz';
export { vertexPositions } from './vertex-positions';
export type { VertexPosition } from './vertex-positions';
