import { describe, expect, it } from 'vitest';
import { seededRandom } from '../src/index';
import { cellCount, forEachOnLine, lineCount, split, tighten, type Box } from '../src/bounds/bevelled-box';
import { boxOfKey, canonicalKey, frameOf } from '../src/bounds/box-frame';

/** The cells of a box read off its definition, one (x, y) at a time: the reference the module must match. */
function cellsByDefinition(b: Box): Set<string> {
  const out = new Set<string>();
  for (let x = b[0]!; x <= b[1]!; x++) {
    for (let y = b[2]!; y <= b[3]!; y++) {
      if (x + y >= b[4]! && x + y <= b[5]! && x - y >= b[6]! && x - y <= b[7]!) out.add(`${x},${y}`);
    }
  }
  return out;
}

/** A random box inside [-3, 12]^2, often empty or thin, from a seed. */
function randomBox(rand: () => number): Box {
  const pick = (lo: number, hi: number) => lo + Math.floor(rand() * (hi - lo + 1));
  const x0 = pick(-3, 8);
  const y0 = pick(-3, 8);
  const x1 = x0 + pick(0, 8);
  const y1 = y0 + pick(0, 8);
  const s0 = pick(x0 + y0 - 1, x1 + y1);
  const d0 = pick(x0 - y1 - 1, x1 - y0);
  return [x0, x1, y0, y1, s0, s0 + pick(0, 16), d0, d0 + pick(0, 16)];
}

const kindValue = (f: number, x: number, y: number) => [x, y, x + y, x - y][f]!;

describe('bevelled boxes', () => {
  const rand = seededRandom(20240611);
  const boxes = Array.from({ length: 3000 }, () => randomBox(rand));

  it('tighten keeps the same cells and makes every bound attained (3000 random boxes)', () => {
    for (const b of boxes) {
      const cells = cellsByDefinition(b);
      const t = tighten(b);
      if (cells.size === 0) {
        expect(t, `${b}`).toBeNull();
        continue;
      }
      expect(t, `${b}`).not.toBeNull();
      expect(cellsByDefinition(t!), `${b}`).toEqual(cells);
      expect(cellCount(t!)).toBe(cells.size);
      const xy = [...cells].map((c) => c.split(',').map(Number) as [number, number]);
      for (let f = 0; f < 4; f++) {
        const values = xy.map(([x, y]) => kindValue(f, x, y));
        expect([t![2 * f], t![2 * f + 1]], `${b} kind ${f}`).toEqual([Math.min(...values), Math.max(...values)]);
      }
    }
  });

  it('counts and lists the cells on each line, and a cut leaves exactly the two sides with no edge between them', () => {
    for (const b of boxes.slice(0, 600)) {
      const t = tighten(b);
      if (!t) continue;
      const cells = cellsByDefinition(t);
      for (let f = 0; f < 4; f++) {
        for (let k = t[2 * f]! - 1; k <= t[2 * f + 1]! + 1; k++) {
          const onLine: string[] = [];
          forEachOnLine(t, f, k, (x, y) => onLine.push(`${x},${y}`));
          const expected = [...cells].filter((c) => {
            const [x, y] = c.split(',').map(Number) as [number, number];
            return kindValue(f, x, y) === k;
          });
          expect(new Set(onLine)).toEqual(new Set(expected));
          expect(lineCount(t, f, k)).toBe(expected.length);
          const [below, above] = split(t, f, k);
          const low = below ? cellsByDefinition(below) : new Set<string>();
          const high = above ? cellsByDefinition(above) : new Set<string>();
          expect(low.size + high.size + expected.length).toBe(cells.size);
          // The separation the constructions rely on: no two side-adjacent cells on opposite sides.
          for (const c of low) {
            const [x, y] = c.split(',').map(Number) as [number, number];
            for (const [dx, dy] of [[1, 0], [-1, 0], [0, 1], [0, -1]]) expect(high.has(`${x + dx!},${y + dy!}`)).toBe(false);
          }
        }
      }
    }
  });

  it('maps each box onto its canonical image cell for cell and line for line, whichever symmetry is used', () => {
    const key = new Int32Array(6);
    for (const b of boxes.slice(0, 1500)) {
      const t = tighten(b);
      if (!t) continue;
      const g = canonicalKey(t, key);
      const frame = frameOf(t, g);
      expect([frame.h, frame.w, ...frame.bevels]).toEqual([...key]);
      const image = boxOfKey(key);
      const imageCells = cellsByDefinition(image);
      const mapped = new Set<string>();
      const index = new Map<string, number>();
      for (const c of cellsByDefinition(t)) {
        const [x, y] = c.split(',').map(Number) as [number, number];
        const i = frame.cellIndex(x, y);
        mapped.add(`${Math.floor(i / frame.w)},${i % frame.w}`);
        index.set(c, i);
      }
      expect(mapped).toEqual(imageCells);
      // A canonical line pulls back to the box's line holding exactly the preimages of its cells.
      for (let f = 0; f < 4; f++) {
        for (let k = image[2 * f]!; k <= image[2 * f + 1]!; k++) {
          const [kind, value] = frame.lineFrom(f, k);
          forEachOnLine(t, kind, value, (x, y) => {
            const i = index.get(`${x},${y}`)!;
            expect(kindValue(f, Math.floor(i / frame.w), i % frame.w)).toBe(k);
          });
          expect(lineCount(t, kind, value)).toBe(lineCount(image, f, k));
        }
      }
    }
  });

  it('gives congruent boxes one key: a box and its turned and mirrored copies', () => {
    const key = new Int32Array(6);
    const other = new Int32Array(6);
    for (const b of boxes.slice(0, 1000)) {
      const t = tighten(b);
      if (!t) continue;
      canonicalKey(t, key);
      // Turn the cells a quarter (x, y) -> (y, -x) and mirror them (x, y) -> (x, -y), then box them again.
      for (const move of [(x: number, y: number) => [y, -x], (x: number, y: number) => [x, -y]] as const) {
        const moved = [...cellsByDefinition(t)].map((c) => move(...(c.split(',').map(Number) as [number, number])));
        const fx = moved.map((p) => p[0]!);
        const fy = moved.map((p) => p[1]!);
        const fs = moved.map((p) => p[0]! + p[1]!);
        const fd = moved.map((p) => p[0]! - p[1]!);
        const box = [Math.min(...fx), Math.max(...fx), Math.min(...fy), Math.max(...fy), Math.min(...fs), Math.max(...fs), Math.min(...fd), Math.max(...fd)];
        canonicalKey(tighten(box)!, other);
        expect([...other]).toEqual([...key]);
      }
    }
  });
});
