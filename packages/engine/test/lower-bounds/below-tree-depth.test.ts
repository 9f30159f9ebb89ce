// The one property every lower bound must have: it never exceeds the true rank number (a bound above it
// is a bug), checked against the independent brute-force subset DP, with every witness re-checked.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cylinderGraph, gridGraph, staircaseGraph, torusGraph, type Graph } from '../../src/index';
import { bestLowerBound, checkLowerBoundWitness } from '../../src/bounds/lower/index';
import { bruteForceTreeDepth } from '../brute-force-td';
import { arbitraryMask, arbitrarySmallGraph, bruteRectangleTable, bruteStaircaseTable } from './support';

const knownRectangle = bruteRectangleTable(20);
const knownStaircase = bruteStaircaseTable(5);

/** Every bound bestLowerBound computes is at most td(g) and passes the checker (tables re-asked). */
function expectSound(g: Graph, td = bruteForceTreeDepth(g)): void {
  const { best, all } = bestLowerBound(g, { knownRectangle, knownStaircase });
  for (const b of all) {
    expect(b.value, `${b.witness.kind}: ${b.argument}`).toBeLessThanOrEqual(td);
    expect(checkLowerBoundWitness(g, b, { knownRectangle, knownStaircase }), b.witness.kind).toMatchObject({ ok: true });
  }
  expect(best.value).toBe(Math.max(...all.map((b) => b.value)));
  expect(best.value).toBeGreaterThanOrEqual(1);
}

describe('every lower bound is at most the brute-force tree-depth', () => {
  it('on random graphs of <= 14 vertices', () => {
    fc.assert(
      fc.property(arbitrarySmallGraph(14), (g) => expectSound(g)),
      { numRuns: 1000 },
    );
  });

  it('on random masks of <= 20 cells (rectangles and staircases valued by brute-force tables)', () => {
    fc.assert(
      fc.property(arbitraryMask(20), (g) => expectSound(g)),
      { numRuns: 1000 },
    );
  });

  it('on every grid with at most 20 cells, and on small staircases, cylinders and tori', () => {
    for (let rows = 1; rows <= 20; rows++) for (let cols = 1; rows * cols <= 20; cols++) expectSound(gridGraph(rows, cols));
    for (let t = 1; t <= 6; t++) expectSound(staircaseGraph(t));
    expectSound(cylinderGraph(3, 5));
    expectSound(torusGraph(4, 4));
  });
});
