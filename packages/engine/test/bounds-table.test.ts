import { describe, expect, it } from 'vitest';
import { boundsTable, DiagonalSplit, diagonalSplitWins, exactTreeDepth, gridGraph, gridLowerBounds, MidlineSplit } from '../src/index';
import { bruteForceTreeDepth } from './brute-force-td';

describe('grid lower bounds and the bounds table', () => {
  it('never exceed the rank number (brute force for mn <= 20, exact search a little beyond)', () => {
    for (let m = 1; m <= 20; m++) {
      for (let n = m; m * n <= 20; n++) {
        const td = bruteForceTreeDepth(gridGraph(m, n));
        for (const b of gridLowerBounds(m, n)) expect(b.value, `${m}x${n}: ${b.argument}`).toBeLessThanOrEqual(td);
      }
    }
    for (const [m, n] of [[3, 8], [4, 6]] as const) {
      const td = exactTreeDepth(gridGraph(m, n)).upper;
      expect(gridLowerBounds(m, n)[0]!.value).toBeLessThanOrEqual(td);
    }
  });

  it('lists every m <= n <= N with lower <= midline split, and the closed form where one applies', () => {
    const table = boundsTable(25);
    expect(table).toHaveLength((25 * 26) / 2);
    for (const row of table) {
      expect(row.lower).toBeLessThanOrEqual(row.midlineSplit);
      if (row.rows <= 2) expect(row.formula).not.toBeNull();
      else expect(row.formula).toBeNull();
    }
    expect(table.find((r) => r.rows === 2 && r.cols === 9)).toMatchObject({ formula: 6, lower: 6 });
  });

  it('puts the diagonal split beside the midline split, and reports where it needs fewer labels', () => {
    const table = boundsTable(25);
    const diagonal = new DiagonalSplit();
    const midline = new MidlineSplit();
    for (const row of table) {
      expect(row.lower, `${row.rows}x${row.cols}`).toBeLessThanOrEqual(row.diagonalSplit);
      expect(row.diagonalSplit).toBe(diagonal.value(row.rows, row.cols));
      expect(row.midlineSplit).toBe(midline.value(row.rows, row.cols));
      // A closed form is the rank number itself, so no ranking can go below it.
      if (row.formula !== null) expect(row.diagonalSplit).toBeGreaterThanOrEqual(row.formula);
    }
    const wins = diagonalSplitWins(table);
    expect(wins).toEqual(table.filter((r) => r.diagonalSplit < r.midlineSplit));
    // Every square from 4 x 4 up is among them (the diagonal-split tests check these sizes one by one).
    for (let n = 4; n <= 25; n++) expect(wins.some((r) => r.rows === n && r.cols === n), `${n}x${n}`).toBe(true);
  });
});
