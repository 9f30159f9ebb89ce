import type { Graph } from '../../graph/graph';

/** A graph's layout as a picture: owner[r * cols + c] = the vertex drawn in that cell, or -1 for a hole. */
export interface GridShape {
  rows: number;
  cols: number;
  owner: Int32Array;
}

/** A rank number the caller knows (exactly, or a lower bound on it), e.g. from the atlas, with where it comes from. */
export interface KnownValue {
  value: number;
  provenance: string;
}

/** Known rank numbers of the full rows x cols grid, asked with rows <= cols (canonical). */
export type KnownRectangleValues = (rows: number, cols: number) => KnownValue | undefined;

/** Known rank numbers of the staircase S(t). */
export type KnownStaircaseValues = (t: number) => KnownValue | undefined;

/** The picture of g's layout, or why there is none (no layout, a cell out of range or shared). */
export function layoutPicture(g: Graph): GridShape | string {
  const layout = g.layout;
  if (!layout) return 'the graph has no grid layout';
  const { rows, cols, cells } = layout;
  if (cells.length !== g.vertexCount) return 'the layout does not place every vertex';
  const owner = new Int32Array(rows * cols).fill(-1);
  for (let v = 0; v < cells.length; v++) {
    const cell = cells[v]!;
    if (!(cell >= 0 && cell < owner.length)) return `vertex ${v} is placed outside the ${rows} x ${cols} layout`;
    if (owner[cell] !== -1) return `vertices ${owner[cell]} and ${v} share a cell`;
    owner[cell] = v;
  }
  return { rows, cols, owner };
}

/**
 * The layout of g as a picture in which side-adjacent present cells are always joined by an edge: then
 * every full block of cells carries its grid graph as a subgraph of g (extra edges, as in a cylinder or
 * torus, only add). Undefined when there is no such picture.
 */
export function gridShapeOf(g: Graph): GridShape | undefined {
  const shape = layoutPicture(g);
  if (typeof shape === 'string') return undefined;
  const { cols, owner } = shape;
  for (let cell = 0; cell < owner.length; cell++) {
    const v = owner[cell]!;
    if (v < 0) continue;
    const right = (cell % cols) + 1 < cols ? owner[cell + 1]! : -1;
    const below = cell + cols < owner.length ? owner[cell + cols]! : -1;
    if ((right >= 0 && !g.hasEdge(v, right)) || (below >= 0 && !g.hasEdge(v, below))) return undefined;
  }
  return shape;
}

/**
 * Why the cells `member(r, c)` of the box rows r0 .. r0 + h - 1, cols c0 .. c0 + w - 1 do not carry their
 * grid graph as a subgraph of g (a cell that is no vertex, or two side-adjacent ones not joined), or
 * undefined when they do. The witness checker's test; it trusts no layout.
 */
export function cellsFailToFormGrid(g: Graph, shape: GridShape, r0: number, c0: number, h: number, w: number, member: (r: number, c: number) => boolean): string | undefined {
  const { rows, cols, owner } = shape;
  if (r0 < 0 || c0 < 0 || h < 1 || w < 1 || r0 + h > rows || c0 + w > cols) return `the box at (${r0}, ${c0}) of ${h} x ${w} cells leaves the ${rows} x ${cols} layout`;
  for (let r = r0; r < r0 + h; r++) {
    for (let c = c0; c < c0 + w; c++) {
      if (!member(r, c)) continue;
      const v = owner[r * cols + c]!;
      if (v < 0) return `cell (${r}, ${c}) is not a vertex`;
      if (c + 1 < c0 + w && member(r, c + 1)) {
        const right = owner[r * cols + c + 1]!;
        if (right >= 0 && !g.hasEdge(v, right)) return `cells (${r}, ${c}) and (${r}, ${c + 1}) are not joined`;
      }
      if (r + 1 < r0 + h && member(r + 1, c)) {
        const below = owner[(r + 1) * cols + c]!;
        if (below >= 0 && !g.hasEdge(v, below)) return `cells (${r}, ${c}) and (${r + 1}, ${c}) are not joined`;
      }
    }
  }
  return undefined;
}
