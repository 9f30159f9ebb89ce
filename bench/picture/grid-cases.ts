import { eliminationForest, gridGraph, midlineSplitRanking, verifyRanking } from '@cairn/engine';
import type { PictureCase } from './page/protocol';

/** A grid with the midline split's ranking, checked by the engine's verifier, and its elimination forest. */
export function verifiedGridCase(rows: number, cols: number): PictureCase & { labelCount: number } {
  const g = gridGraph(rows, cols);
  const { labels, value } = midlineSplitRanking(rows, cols);
  const verdict = verifyRanking(g, labels);
  if (!verdict.valid) throw new Error(`the midline split of the ${rows} x ${cols} grid must be a ranking`);
  return { rows, cols, labels: Array.from(labels), parents: Array.from(eliminationForest(g, labels)), labelCount: value };
}

function ancestors(parents: readonly number[], v: number): Set<number> {
  const out = new Set<number>();
  for (let p = parents[v]!; p >= 0; p = parents[p]!) out.add(p);
  return out;
}

/**
 * Two cells to hover in turn, each with a probe: its parent in the forest, which the hover lights and
 * which the other hover leaves unlit (so a probe changing colour means that hover's redraw is done).
 * Opposite corners of the grid lie in different small rectangles of the split, so their parents differ.
 */
export function hoverPair(c: PictureCase): [{ v: number; probe: number }, { v: number; probe: number }] {
  const a = 0;
  const b = c.rows * c.cols - 1;
  const pa = c.parents[a]!;
  const pb = c.parents[b]!;
  if (pa < 0 || pb < 0 || ancestors(c.parents, b).has(pa) || ancestors(c.parents, a).has(pb)) {
    throw new Error('the corners must have parents that are not above the other corner');
  }
  return [
    { v: a, probe: pa },
    { v: b, probe: pb },
  ];
}
