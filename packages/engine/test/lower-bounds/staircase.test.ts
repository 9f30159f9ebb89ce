import { describe, expect, it } from 'vitest';
import { gridGraph, pathRankNumber, staircaseGraph } from '../../src/index';
import { checkLowerBoundWitness, STAIRCASE_PATH_PROVENANCE, staircaseBound } from '../../src/bounds/lower/index';
import { bruteForceTreeDepth } from '../brute-force-td';
import { bruteStaircaseTable, cachedTd, maskFrom } from './support';

const table = bruteStaircaseTable(5);

/** S(t) drawn with its corner at one of the four box corners, inside a frame of holes. */
function orientedStaircase(t: number, corner: 'tl' | 'tr' | 'bl' | 'br'): string[] {
  const lines: string[] = [];
  for (let r = 0; r < t; r++) {
    let line = '';
    for (let c = 0; c < t; c++) {
      const i = corner[0] === 't' ? r : t - 1 - r;
      const j = corner[1] === 'l' ? c : t - 1 - c;
      line += i + j < t ? '#' : '.';
    }
    lines.push(`.${line}.`);
  }
  const blank = '.'.repeat(t + 2);
  return [blank, ...lines, blank];
}

describe('staircaseBound', () => {
  it('finds S(t) in the staircase graph and values it from the table (brute force, t <= 5)', () => {
    for (let t = 1; t <= 5; t++) {
      const g = staircaseGraph(t);
      const b = staircaseBound(g, table)!;
      const td = cachedTd(`staircase ${t}`, () => staircaseGraph(t));
      // On a tie the path on 2t − 1 cells is kept: it can be checked without the table.
      const provenance = td > pathRankNumber(2 * t - 1) ? 'test:brute-force' : STAIRCASE_PATH_PROVENANCE;
      expect(b.witness).toEqual({ kind: 'staircase', row: 0, col: 0, t, value: td, provenance });
      expect(checkLowerBoundWitness(g, b, { knownStaircase: table })).toEqual({ ok: true });
    }
  });

  it('finds all four orientations, anchoring the witness at the top-left of the t x t box', () => {
    for (const corner of ['tl', 'tr', 'bl', 'br'] as const) {
      const g = maskFrom(...orientedStaircase(5, corner));
      const b = staircaseBound(g, table)!;
      expect(b.witness, corner).toMatchObject({ kind: 'staircase', row: 1, col: 1, t: 5 });
      expect(checkLowerBoundWitness(g, b, { knownStaircase: table })).toEqual({ ok: true });
      expect(b.value).toBeLessThanOrEqual(bruteForceTreeDepth(g));
    }
  });

  it('without a table claims only the path on 2t − 1 cells (Bodlaender et al. 1998)', () => {
    for (let t = 1; t <= 6; t++) {
      const g = staircaseGraph(t);
      const b = staircaseBound(g)!;
      expect(b.witness).toMatchObject({ t, value: pathRankNumber(2 * t - 1), provenance: STAIRCASE_PATH_PROVENANCE });
      expect(b.value).toBeLessThanOrEqual(bruteForceTreeDepth(g));
      expect(checkLowerBoundWitness(g, b)).toEqual({ ok: true });
    }
  });

  it('uses a smaller known staircase inside a larger unknown one', () => {
    const g = staircaseGraph(8);
    const b = staircaseBound(g, table)!; // the table knows t <= 5 only
    expect(b.witness).toMatchObject({ t: 5, row: 0, col: 0, provenance: 'test:brute-force' });
    expect(checkLowerBoundWitness(g, b, { knownStaircase: table })).toEqual({ ok: true });
  });

  it('a full grid contains the staircase of its shorter side', () => {
    expect(staircaseBound(gridGraph(4, 9))!.witness).toMatchObject({ t: 4 });
  });
});
