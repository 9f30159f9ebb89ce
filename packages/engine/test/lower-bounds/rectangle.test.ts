import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cylinderGraph, graphFromEdges, grid2RankNumber, gridGraph, pathRankNumber, torusGraph } from '../../src/index';
import { checkLowerBoundWitness, rectangleBound } from '../../src/bounds/lower/index';
import { gridShapeOf } from '../../src/bounds/lower/grid-shape';
import { forEachMaximalBlock } from '../../src/bounds/lower/rectangle';
import { bruteForceTreeDepth } from '../brute-force-td';
import { arbitraryMask, bruteRectangleTable, cachedTd, maskFrom } from './support';

const table = bruteRectangleTable(20);

describe('rectangleBound', () => {
  it('on the 5 x 5 grid uses 2 x 5, valued by the 2 x n closed form (Alpert, Discrete Math. 2010)', () => {
    const g = gridGraph(5, 5);
    const b = rectangleBound(g)!;
    expect(b.witness).toEqual({ kind: 'rectangle', row: 0, col: 0, rows: 2, cols: 5, value: grid2RankNumber(5), provenance: 'formula:grid-2xn' });
    expect(b.value).toBe(5);
    expect(b.argument).toContain('Alpert');
    expect(checkLowerBoundWitness(g, b)).toEqual({ ok: true });
  });

  it('on a 1 x n grid uses the path form (Bodlaender et al. 1998)', () => {
    for (const [r, c] of [[1, 9], [13, 1]] as const) {
      const b = rectangleBound(gridGraph(r, c))!;
      expect(b.witness).toMatchObject({ rows: r, cols: c, provenance: 'formula:path', value: pathRankNumber(r * c) });
    }
  });

  it('with a known table, uses the largest known sub-block: 4 x 5 inside 5 x 5 (table by brute force)', () => {
    const b = rectangleBound(gridGraph(5, 5), table)!;
    expect(b.witness).toMatchObject({ kind: 'rectangle', row: 0, col: 0, rows: 4, cols: 5, provenance: 'test:brute-force' });
    expect(b.value).toBe(cachedTd('grid 4x5', () => gridGraph(4, 5)));
    expect(checkLowerBoundWitness(gridGraph(5, 5), b, { knownRectangle: table })).toEqual({ ok: true });
  });

  it('finds the largest full rectangle in a grid with holes', () => {
    const g = maskFrom(
      '#.#.#.#.', //
      '.######.',
      '.######.',
      '.######.',
    );
    const td = bruteForceTreeDepth(g);
    const known = rectangleBound(g, table)!;
    expect(known.witness).toMatchObject({ row: 1, col: 1, rows: 3, cols: 6, value: cachedTd('grid 3x6', () => gridGraph(3, 6)) });
    expect(known.value).toBeLessThanOrEqual(td);
    const closed = rectangleBound(g)!;
    expect(closed.witness).toMatchObject({ row: 1, col: 1, rows: 2, cols: 6, value: grid2RankNumber(6), provenance: 'formula:grid-2xn' });
    for (const b of [known, closed]) expect(checkLowerBoundWitness(g, b, { knownRectangle: table })).toEqual({ ok: true });
  });

  it('goes by value, not area: a 2 x 12 strip beats a 5 x 5 block', () => {
    const g = maskFrom(
      '#####.......', //
      '#####.......',
      '#####.......',
      '#####.......',
      '#####.......',
      '............',
      '############',
      '############',
    );
    const b = rectangleBound(g)!;
    expect(b.witness).toMatchObject({ row: 6, col: 0, rows: 2, cols: 12, value: grid2RankNumber(12) });
    expect(grid2RankNumber(12)).toBeGreaterThan(grid2RankNumber(5));
  });

  it('works on cylinders and tori (extra edges only add) and refuses layouts whose cells are not joined', () => {
    expect(rectangleBound(cylinderGraph(2, 9))).toMatchObject({ value: grid2RankNumber(9) });
    expect(rectangleBound(torusGraph(4, 6))).toMatchObject({ value: grid2RankNumber(6) });
    const loose = graphFromEdges(4, [0, 1], undefined, { rows: 2, cols: 2, cells: Int32Array.from([0, 1, 2, 3]) });
    expect(rectangleBound(loose)).toBeUndefined();
    expect(rectangleBound(graphFromEdges(3, [0, 1, 1, 2]))).toBeUndefined();
  });

  it('asks the table canonically and says when the box of sizes is too big to ask about', () => {
    const asked: [number, number][] = [];
    const b = rectangleBound(gridGraph(6, 9), (r, c) => (asked.push([r, c]), undefined), { maxTableQueries: 10 })!;
    expect(asked.every(([r, c]) => r <= c)).toBe(true);
    expect(b.argument).toContain('asked only about');
  });

  it('examines every maximal full rectangle (random masks of up to 64 cells, against trying every block)', () => {
    fc.assert(
      fc.property(arbitraryMask(64), (g) => {
        const shape = gridShapeOf(g)!;
        const { rows, cols, owner } = shape;
        const full = (r: number, c: number, h: number, w: number) => {
          if (r < 0 || c < 0 || r + h > rows || c + w > cols) return false;
          for (let i = r; i < r + h; i++) for (let j = c; j < c + w; j++) if (owner[i * cols + j]! < 0) return false;
          return true;
        };
        const seen = new Set<string>();
        forEachMaximalBlock(shape, (h, w, r, c) => {
          expect(full(r, c, h, w)).toBe(true);
          seen.add(`${r},${c},${h},${w}`);
        });
        for (let r = 0; r < rows; r++) {
          for (let c = 0; c < cols; c++) {
            for (let h = 1; r + h <= rows; h++) {
              for (let w = 1; c + w <= cols; w++) {
                if (!full(r, c, h, w)) continue;
                const maximal = !full(r - 1, c, h + 1, w) && !full(r, c, h + 1, w) && !full(r, c - 1, h, w + 1) && !full(r, c, h, w + 1);
                if (maximal) expect(seen.has(`${r},${c},${h},${w}`), `${h} x ${w} at (${r}, ${c})`).toBe(true);
              }
            }
          }
        }
      }),
      { numRuns: 1000 },
    );
  });
});
