import { describe, expect, it } from 'vitest';
import {
  BevelledSplit,
  exactTreeDepth,
  gridLowerBounds,
  maskGraph,
  seededRandom,
  staircaseGraph,
  StaircaseRanking,
  staircaseRanking,
  staircaseVertex,
  verifyRanking,
  type Graph,
} from '../src/index';
import { cellCount, tighten, type Box } from '../src/bounds/bevelled-box';
import { bruteForceTreeDepth } from './brute-force-td';

const maxLabel = (labels: Int32Array) => labels.reduce((a, b) => Math.max(a, b), 0);

/** A tight box with its corners at (0, 0), as a mask graph, with the labels the split gives its cells. */
function boxAsMask(split: BevelledSplit, b: Box): { g: Graph; labels: Int32Array; value: number } {
  const h = b[1]! + 1;
  const w = b[3]! + 1;
  const present = new Uint8Array(h * w);
  const byCell = new Int32Array(h * w);
  const value = split.label(b, (x, y, label) => {
    present[x * w + y] = 1;
    byCell[x * w + y] = label;
  });
  const g = maskGraph({ rows: h, cols: w, present });
  return { g, labels: Int32Array.from(g.layout!.cells, (cell) => byCell[cell]!), value };
}

/** Random tight boxes with a corner at the origin: rectangles with their corners cut along diagonals. */
function randomBoxes(count: number, maxSide: number, seed: number): Box[] {
  const rand = seededRandom(seed);
  const out: Box[] = [];
  while (out.length < count) {
    const h = 1 + Math.floor(rand() * maxSide);
    const w = 1 + Math.floor(rand() * maxSide);
    const cut = () => Math.floor(rand() * Math.min(h, w));
    const t = tighten([0, h - 1, 0, w - 1, cut(), h + w - 2 - cut(), -(w - 1) + cut(), h - 1 - cut()]);
    if (t && t[0] === 0 && t[2] === 0) out.push(t);
  }
  return out;
}

describe('staircase construction', () => {
  it('gives S(t) a ranking that passes the verifier and uses exactly its value, for every t <= 40', () => {
    const stairs = new StaircaseRanking();
    for (let t = 1; t <= 40; t++) {
      const bound = stairs.ranking(t);
      const verdict = verifyRanking(staircaseGraph(t), bound.labels);
      expect(verdict.valid, `S(${t})`).toBe(true);
      expect(maxLabel(bound.labels), `S(${t})`).toBe(bound.value);
      expect(stairs.value(t)).toBe(bound.value);
    }
  });

  it('numbers cells as staircaseGraph does (row i holds t - i cells, in turn)', () => {
    const g = staircaseGraph(9);
    const cells = g.layout!.cells;
    for (let i = 0; i < 9; i++) for (let j = 0; i + j < 9; j++) expect(cells[staircaseVertex(9, i, j)]).toBe(i * 9 + j);
  });

  it('is never below the exact rank number of S(t), t <= 7 (exact search), and meets it there', () => {
    const stairs = new StaircaseRanking();
    for (let t = 1; t <= 7; t++) {
      const exact = exactTreeDepth(staircaseGraph(t));
      expect(exact.status).toBe('exact');
      expect(stairs.value(t), `S(${t})`).toBeGreaterThanOrEqual(exact.upper);
      // Not a requirement of a bound, but what the program achieves: a change that loses it is a regression.
      expect(stairs.value(t), `S(${t})`).toBe(exact.upper);
    }
  }, 60_000);

  it('stays above what the size of S(t) proves: its contained square (td >= tw + 1, tw of a k x k grid = k)', () => {
    const stairs = new StaircaseRanking();
    for (const t of [10, 50, 200, 1000, 3000]) {
      // S(t) contains the ⌈t/2⌉ x ⌊t/2⌋ rectangle at its corner (i < ⌈t/2⌉, j < ⌊t/2⌋ gives i + j < t).
      const square = gridLowerBounds(Math.ceil(t / 2), Math.floor(t / 2))[0]!.value;
      expect(stairs.value(t), `S(${t})`).toBeGreaterThanOrEqual(square);
    }
  });

  it('ranks a large staircase: S(1500), 1.1 million cells', () => {
    const bound = staircaseRanking(1500);
    expect(verifyRanking(staircaseGraph(1500), bound.labels)).toMatchObject({ valid: true, maxLabel: bound.value });
  });
});

describe('bevelled split (the program behind the staircase construction and the diagonal split)', () => {
  it('ranks 400 random bevelled boxes up to 24 x 24: every labelling passes the verifier with its value', () => {
    const split = new BevelledSplit();
    for (const b of randomBoxes(400, 24, 7)) {
      const { g, labels, value } = boxAsMask(split, b);
      const verdict = verifyRanking(g, labels);
      expect(verdict.valid, `box ${b}`).toBe(true);
      expect(verdict.maxLabel, `box ${b}`).toBe(value);
      expect(split.value(b)).toBe(value);
    }
  });

  it('also when boxes are large enough to take their moves from scaled-down images (up to 90 x 90)', () => {
    const split = new BevelledSplit();
    for (const b of randomBoxes(40, 90, 11)) {
      const { g, labels, value } = boxAsMask(split, b);
      expect(verifyRanking(g, labels)).toMatchObject({ valid: true, maxLabel: value });
    }
  });

  it('never goes below the rank number of small boxes (brute force over vertex subsets, <= 20 cells)', () => {
    const split = new BevelledSplit();
    let checked = 0;
    for (const b of randomBoxes(300, 6, 3)) {
      if (cellCount(b) > 20) continue;
      const { g, value } = boxAsMask(split, b);
      expect(value, `box ${b}`).toBeGreaterThanOrEqual(bruteForceTreeDepth(g));
      checked++;
    }
    expect(checked).toBeGreaterThan(100);
  });

  it('still gives rankings when tuned coarsely (full search only up to 6 x 6, no window)', () => {
    const quick = new BevelledSplit({ fullSearchExtent: 6, window: 0 });
    for (const b of randomBoxes(60, 40, 5)) {
      const { g, labels, value } = boxAsMask(quick, b);
      expect(verifyRanking(g, labels)).toMatchObject({ valid: true, maxLabel: value });
    }
  });
});
