import { describe, expect, it } from 'vitest';
import { cylinderGraph, gridGraph, maskGraph, seededRandom, staircaseGraph, type Graph } from '../src/index';
import { containedRectangles } from '../src/exact/contained-rectangles';

/** A rows x cols box with each cell kept with probability keep. */
function randomMask(rows: number, cols: number, keep: number, seed: number): Graph {
  const rand = seededRandom(seed);
  const present = new Uint8Array(rows * cols);
  for (let i = 0; i < present.length; i++) present[i] = rand() < keep ? 1 : 0;
  return maskGraph({ rows, cols, present });
}

/** Every size a x b (3 <= a <= b, a * b below the vertex count) with a full block somewhere, by trying every placement. */
function sizesByBruteForce(g: Graph): string[] {
  const { rows, cols, cells } = g.layout!;
  const present = new Uint8Array(rows * cols);
  for (const cell of cells) present[cell] = 1;
  const full = (r0: number, c0: number, h: number, w: number) => {
    for (let r = r0; r < r0 + h; r++) for (let c = c0; c < c0 + w; c++) if (!present[r * cols + c]) return false;
    return true;
  };
  const sizes = new Set<string>();
  for (let h = 3; h <= rows; h++)
    for (let w = 3; w <= cols; w++)
      for (let r = 0; r + h <= rows; r++)
        for (let c = 0; c + w <= cols; c++) if (h * w < g.vertexCount && full(r, c, h, w)) sizes.add(`${Math.min(h, w)}x${Math.max(h, w)}`);
  return [...sizes].sort();
}

/** Whether the set is exactly the vertices of one full h x w block of the layout (either orientation). */
function isBlock(g: Graph, vertices: number[], a: number, b: number): boolean {
  const { cols, cells } = g.layout!;
  const rs = vertices.map((v) => Math.floor(cells[v]! / cols));
  const cs = vertices.map((v) => cells[v]! % cols);
  const h = Math.max(...rs) - Math.min(...rs) + 1;
  const w = Math.max(...cs) - Math.min(...cs) + 1;
  return vertices.length === a * b && h * w === a * b && Math.min(h, w) === a && Math.max(h, w) === b;
}

describe('the rectangles the exact search tabulates first', () => {
  it('are one full block of every size that fits, smallest first, on 200 random masks (against trying every placement)', () => {
    for (let seed = 1; seed <= 200; seed++) {
      const g = randomMask(3 + (seed % 6), 3 + (seed % 8), 0.85, seed);
      const found = containedRectangles(g);
      expect(found.map((r) => `${Math.min(r.rows, r.cols)}x${Math.max(r.rows, r.cols)}`).sort(), `seed ${seed}`).toEqual(sizesByBruteForce(g));
      for (let i = 1; i < found.length; i++) expect(found[i]!.rows * found[i]!.cols).toBeGreaterThanOrEqual(found[i - 1]!.rows * found[i - 1]!.cols);
      for (const r of found) {
        const vertices: number[] = [];
        r.cells().forEach((v) => vertices.push(v));
        expect(isBlock(g, vertices, Math.min(r.rows, r.cols), Math.max(r.rows, r.cols)), `seed ${seed}, ${r.rows}x${r.cols}`).toBe(true);
      }
    }
  });

  it('on a full grid are all a x b with 3 <= a, below the whole grid, and on a staircase those under its diagonal', () => {
    const sizes = (g: Graph) => containedRectangles(g).map((r) => `${Math.min(r.rows, r.cols)}x${Math.max(r.rows, r.cols)}`);
    expect(sizes(gridGraph(4, 5))).toEqual(['3x3', '3x4', '3x5', '4x4']);
    expect(sizes(gridGraph(3, 3))).toEqual([]);
    // S(8): a block a x b fits under the staircase exactly when a + b <= 9.
    expect(sizes(staircaseGraph(8))).toEqual(['3x3', '3x4', '3x5', '4x4', '3x6', '4x5']);
    // A cylinder's side-adjacent cells are joined too (its blocks are subgraphs): it has a layout picture.
    expect(sizes(cylinderGraph(3, 4))).toEqual(['3x3']);
  });
});
