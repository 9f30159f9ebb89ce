import { describe, expect, it } from 'vitest';
import { Bitset, gridGraph, maskGraph, seededRandom } from '../src/index';
import { ShapeCanon } from '../src/exact/shape-canon';
import { bruteForceTreeDepth } from './brute-force-td';

// The exact search's rectangle bound with missing cells, td(S) >= value(R) - |R \ S| (td never grows on
// subgraphs and drops by at most one per removed vertex; DESIGN "Monotonicity"), and the window it
// confines tops to, both checked against the independent brute force on random cell sets of a 4 x 4 box.
const exact = new Map<string, number>();
const value = (h: number, w: number): number => {
  const key = `${Math.min(h, w)}x${Math.max(h, w)}`;
  let v = exact.get(key);
  if (v === undefined) exact.set(key, (v = bruteForceTreeDepth(gridGraph(h, w))));
  return v;
};

const rows = 6;
const cols = 6;
const g = gridGraph(rows, cols);
const canon = new ShapeCanon(g);

function tdOf(cells: number[]): number {
  const present = new Uint8Array(rows * cols);
  for (const v of cells) present[v] = 1;
  return bruteForceTreeDepth(maskGraph({ rows, cols, present }));
}

function randomSet(seed: number): number[] {
  const rand = seededRandom(seed);
  const [dr, dc] = [Math.floor(rand() * 3), Math.floor(rand() * 3)];
  const keep = 0.6 + 0.4 * rand();
  const cells: number[] = [];
  for (let r = 0; r < 4; r++) for (let c = 0; c < 4; c++) if (rand() < keep) cells.push((r + dr) * cols + c + dc);
  return cells.length ? cells : [dr * cols + dc];
}

describe('rectangle bound with missing cells', () => {
  it('never exceeds the brute-force tree-depth of the set', () => {
    for (let seed = 1; seed <= 80; seed++) {
      const cells = randomSet(seed);
      const bound = canon.rectangleBound(Bitset.of(rows * cols, cells), value);
      expect(bound, `seed ${seed}`).toBeLessThanOrEqual(tdOf(cells));
    }
  });

  it('confines the top: a vertex outside the window leaves more than k - 1 (brute force)', () => {
    for (let seed = 1; seed <= 40; seed++) {
      const cells = randomSet(seed);
      const td = tdOf(cells);
      for (const k of [td - 1, td]) {
        if (k < 1) continue;
        const win = canon.topWindow(Bitset.of(rows * cols, cells), k, value);
        if (!win) {
          expect(td, `seed ${seed} k ${k}: no window`).toBeGreaterThan(k);
          continue;
        }
        for (const v of cells) {
          if (canon.inWindow(v, win)) continue;
          expect(tdOf(cells.filter((u) => u !== v)), `seed ${seed} k ${k} v ${v}`).toBeGreaterThan(k - 1);
        }
      }
    }
  });
});
