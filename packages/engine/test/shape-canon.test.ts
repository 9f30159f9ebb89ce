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
