import { bestLowerBound, gridGraph, maskGraph, seededRandom, type Graph } from '@cairn/engine';
import { runCases } from '../harness';

/**
 * The rows x cols grid with exactly `fraction` of its cells removed, chosen by a seeded partial
 * Fisher–Yates shuffle (common practice), so every run times the same mask.
 */
export function holedGrid(rows: number, cols: number, fraction: number, seed: number): Graph {
  const total = rows * cols;
  const order = new Int32Array(total);
  for (let i = 0; i < total; i++) order[i] = i;
  const rand = seededRandom(seed);
  const present = new Uint8Array(total).fill(1);
  const remove = Math.round(total * fraction);
  for (let i = 0; i < remove; i++) {
    const j = i + Math.floor(rand() * (total - i));
    const cell = order[j]!;
    order[j] = order[i]!;
    order[i] = cell;
    present[cell] = 0;
  }
  return maskGraph({ rows, cols, present });
}

/**
 * Targets: bestLowerBound (every bound with its default budget, witnesses included) on the 300 x 300 grid
 * and on a mask of about 10^5 cells (the 333 x 334 grid less 10% of its cells: 100,100 cells) <= 500 ms each.
 */
export function lowerBoundsSuite(maxTime: number) {
  const grid = gridGraph(300, 300);
  const mask = holedGrid(333, 334, 0.1, 2024);
  return runCases(
    {
      'bestLowerBound grid 300x300': { targetMs: 500, run: () => void bestLowerBound(grid) },
      'bestLowerBound mask 10^5 cells (10% holes)': { targetMs: 500, run: () => void bestLowerBound(mask) },
    },
    maxTime,
  );
}
