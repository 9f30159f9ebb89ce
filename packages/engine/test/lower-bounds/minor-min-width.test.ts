import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { completeGraph, cycleGraph, graphFromEdges, gridGraph, randomGraph, randomTree } from '../../src/index';
import { checkLowerBoundWitness, degeneracyBound, minorMinWidthBound } from '../../src/bounds/lower/index';
import { bruteForceTreeDepth } from '../brute-force-td';
import { arbitrarySmallGraph } from './support';

const widthOf = (b: ReturnType<typeof minorMinWidthBound>) => (b.witness.kind === 'minor-min-width' ? b.witness.width : NaN);

describe('minorMinWidthBound', () => {
  it('on k x k grids: width <= k = tw (common practice), and width + 1 <= the brute-force td for k <= 4', () => {
    for (let k = 2; k <= 40; k++) {
      const g = gridGraph(k, k);
      const b = minorMinWidthBound(g);
      expect(widthOf(b), `${k}x${k}`).toBeLessThanOrEqual(k);
      expect(widthOf(b)).toBeGreaterThanOrEqual(2); // the grid's own minimum degree (its corners)
      expect(checkLowerBoundWitness(g, b)).toEqual({ ok: true });
      if (k <= 4) expect(b.value).toBeLessThanOrEqual(bruteForceTreeDepth(g));
    }
  });

  it('is exact where tw is plain: K_n gives n, trees give 2, cycles give 3', () => {
    for (let n = 1; n <= 15; n++) expect(minorMinWidthBound(completeGraph(n)).value).toBe(n);
    // A minor of a tree is a forest, so every minimum degree met is <= 1; the first is 1.
    expect(minorMinWidthBound(randomTree(500, 8)).value).toBe(2);
    for (let n = 3; n <= 30; n++) expect(minorMinWidthBound(cycleGraph(n)).value).toBe(3);
    expect(minorMinWidthBound(graphFromEdges(5, [])).value).toBe(1);
    expect(minorMinWidthBound(graphFromEdges(0, [])).value).toBe(0);
  });

  it('never falls below the degeneracy, and its witness replays (random graphs of <= 14 vertices)', () => {
    // Each minor met contains G minus the vertices removed so far as a subgraph (a contraction keeps u
    // and gives it v's edges), so when the first vertex of the d-core goes, the minimum degree is >= d.
    fc.assert(
      fc.property(arbitrarySmallGraph(14), (g) => {
        const b = minorMinWidthBound(g);
        const d = degeneracyBound(g).witness;
        expect(widthOf(b)).toBeGreaterThanOrEqual(d.kind === 'degeneracy' ? d.degeneracy : NaN);
        expect(checkLowerBoundWitness(g, b)).toEqual({ ok: true });
      }),
      { numRuns: 1000 },
    );
  });

  it('a capped run is still valid, no better than the full run, and says so', () => {
    const g = randomGraph(300, 0.04, 2);
    const full = minorMinWidthBound(g);
    expect(full.value).toBeGreaterThanOrEqual(degeneracyBound(g).value);
    const capped = minorMinWidthBound(g, { budget: 200 });
    expect(capped.argument).toContain('work cap');
    expect(checkLowerBoundWitness(g, capped)).toEqual({ ok: true });
    expect(capped.value).toBeLessThanOrEqual(full.value); // a capped run is a prefix of the full one
  });
});
