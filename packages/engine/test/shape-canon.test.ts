import { describe, expect, it } from 'vitest';
import { Bitset, gridGraph, maskGraph, seededRandom } from '../src/index';
import { ShapeCanon } from '../src/exact/shape-canon';

describe('canonical grid shapes', () => {
  it('give one key to a shape and its translates, rotations and reflections, and map cells back', () => {
    const g = gridGraph(9, 9);
    const canon = new ShapeCanon(g);
    const rand = seededRandom(3);
    for (let trial = 0; trial < 200; trial++) {
      // A random set of cells in a 4 x 5 box, placed at some offset, under each of the 8 symmetries.
      const cells: [number, number][] = [];
      for (let r = 0; r < 4; r++) for (let c = 0; c < 5; c++) if (rand() < 0.5) cells.push([r, c]);
      if (cells.length === 0) continue;
      const images = [
        (r: number, c: number) => [r, c], (r: number, c: number) => [r, 4 - c], (r: number, c: number) => [3 - r, c], (r: number, c: number) => [3 - r, 4 - c],
        (r: number, c: number) => [c, r], (r: number, c: number) => [c, 3 - r], (r: number, c: number) => [4 - c, r], (r: number, c: number) => [4 - c, 3 - r],
      ];
      const keys = images.map((f, i) => {
        const [dr, dc] = [i % 4, (i * 3) % 4];
        const set = Bitset.of(81, cells.map(([r, c]) => {
          const [x, y] = f(r, c) as [number, number];
          return (x + dr) * 9 + y + dc;
        }));
        const shape = canon.canonical(set);
        for (const v of set) expect(shape.fromCanonical(shape.toCanonical(v))).toBe(v);
        return shape.key;
      });
      for (const k of keys) expect(k.equals(keys[0]!)).toBe(true);
    }
  });

  it('tells different shapes apart and applies only to grids, masks and staircases', () => {
    const g = gridGraph(4, 4);
    const canon = new ShapeCanon(g);
    const line = canon.canonical(Bitset.of(16, [0, 1, 2]));
    const bend = canon.canonical(Bitset.of(16, [0, 1, 5]));
    expect(line.key.equals(bend.key)).toBe(false);
    expect(ShapeCanon.applies(maskGraph({ rows: 2, cols: 2, present: Uint8Array.from([1, 1, 1, 0]) }))).toBe(true);
  });
});

describe('full rectangles inside a shape', () => {
  it('include a rectangle of every largest height and width that fits, each one full (random masks, brute force)', () => {
    const rand = seededRandom(11);
    for (let trial = 0; trial < 150; trial++) {
      const rows = 2 + Math.floor(rand() * 5);
      const cols = 2 + Math.floor(rand() * 6);
      const present = Uint8Array.from({ length: rows * cols }, () => (rand() < 0.75 ? 1 : 0));
      present[0] = 1;
      const g = maskGraph({ rows, cols, present });
      const canon = new ShapeCanon(g);
      const found = canon.fullRectangles(Bitset.full(g.vertexCount));
      const full = (r: number, c: number, h: number, w: number) => {
        for (let i = r; i < r + h; i++) for (let j = c; j < c + w; j++) if (!present[i * cols + j]) return false;
        return true;
      };
      // Brute force: the largest area of a full rectangle, and every found one fits somewhere.
      let bestArea = 0;
      for (let r = 0; r < rows; r++) for (let c = 0; c < cols; c++) for (let h = 1; r + h <= rows; h++) for (let w = 1; c + w <= cols; w++) if (full(r, c, h, w)) bestArea = Math.max(bestArea, h * w);
      expect(Math.max(...found.map(([h, w]) => h * w))).toBe(bestArea);
      for (const [h, w] of found) {
        let fits = false;
        for (let r = 0; r + h <= rows && !fits; r++) for (let c = 0; c + w <= cols && !fits; c++) fits = full(r, c, h, w);
        expect(fits, `${h}x${w}`).toBe(true);
      }
    }
  });
});

describe('separator rectangles', () => {
  // The list written out plainly: every rectangle of the set's bounding box with its slack
  // k - value(R) + |R \ set| (capped at maxSize), kept when below maxSize and no other rectangle inside it
  // has slack as small, the tightest first and of equal slack the smallest, at most 256.
  function plainly(rows: number, cols: number, present: (r: number, c: number) => boolean, box: number[], k: number, value: (h: number, w: number) => number, maxSize: number): number[][] {
    const [top, bottom, left, right] = box as [number, number, number, number];
    const all: number[][] = [];
    for (let h = 1; h <= bottom - top + 1; h++) {
      for (let w = 1; w <= right - left + 1; w++) {
        for (let r = top; r + h - 1 <= bottom; r++) {
          for (let c = left; c + w - 1 <= right; c++) {
            let missing = 0;
            for (let y = r; y < r + h; y++) for (let x = c; x < c + w; x++) if (!present(y, x)) missing++;
            all.push([r, r + h - 1, c, c + w - 1, Math.min(maxSize, k - value(h, w) + missing)]);
          }
        }
      }
    }
    const inside = (a: number[], b: number[]) => a !== b && a[0]! >= b[0]! && a[1]! <= b[1]! && a[2]! >= b[2]! && a[3]! <= b[3]!;
    const kept = all.filter((q) => q[4]! < maxSize && !all.some((p) => inside(p, q) && p[4]! <= q[4]!));
    const area = (q: number[]) => (q[1]! - q[0]! + 1) * (q[3]! - q[2]! + 1);
    // Array.prototype.sort is stable, so ties keep the order of generation, as the engine's counting sort does.
    return kept.sort((a, b) => a[4]! - b[4]! || area(a) - area(b)).slice(0, 256).map((q) => q.slice(0, 5));
  }

  it('are the plainly computed list on 62 random masks and value tables, for several label budgets', () => {
    const rand = seededRandom(41);
    // Any table of values will do for the list's definition: a random one meets more ties and nestings.
    const table = Array.from({ length: 16 * 16 }, () => 1 + Math.floor(rand() * 6));
    const randomValue = (h: number, w: number) => table[16 * h + w]!;
    // Values growing with both sides (the larger rectangle the tighter) leave far more than 256 unimplied.
    const growingValue = (h: number, w: number) => h + w - 1;
    let listed = 0;
    let longest = 0;
    // The last two are larger, so that more than the 256 kept qualify.
    for (let trial = 0; trial < 62; trial++) {
      const rows = trial < 60 ? 3 + Math.floor(rand() * 5) : 10;
      const cols = trial < 60 ? 3 + Math.floor(rand() * 6) : 11;
      const present = new Uint8Array(rows * cols).map(() => (rand() < 0.85 ? 1 : 0));
      present[0] = 1;
      const g = maskGraph({ rows, cols, present });
      const { cells } = g.layout!;
      const canon = new ShapeCanon(g);
      const value = trial < 60 ? randomValue : growingValue;
      const set = Bitset.full(g.vertexCount);
      const rowsOf = Array.from(cells, (p) => Math.floor(p / cols));
      const colsOf = Array.from(cells, (p) => p % cols);
      const box = [Math.min(...rowsOf), Math.max(...rowsOf), Math.min(...colsOf), Math.max(...colsOf)];
      // The search asks only for budgets at or above the rectangle bound (no slack below zero).
      const bound = Math.max(...plainly(rows, cols, (r, c) => present[r * cols + c] === 1, box, 0, value, 1000).map((q) => -q[4]!));
      for (const k of trial < 60 ? [bound, bound + 2, bound + 5] : [bound + 3]) {
        const maxSize = k - 1;
        const got = canon.separatorRectangles(set, k, value, maxSize);
        const chunks = Array.from({ length: got.length / 5 }, (_, i) => Array.from(got.subarray(5 * i, 5 * i + 5)));
        expect(chunks, `trial ${trial}, k = ${k}`).toEqual(plainly(rows, cols, (r, c) => present[r * cols + c] === 1, box, k, value, maxSize));
        listed += chunks.length;
        longest = Math.max(longest, chunks.length);
      }
    }
    expect(listed).toBeGreaterThan(1000);
    expect(longest).toBe(256); // the cap was reached, and cut in the right place
  });
});
