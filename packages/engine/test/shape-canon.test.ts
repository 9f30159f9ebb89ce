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
