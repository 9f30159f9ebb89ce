import { describe, expect, it } from 'vitest';
import { Bitset, gridGraph, maskGraph, seededRandom, type Graph } from '../src/index';
import { GridSeparators } from '../src/exact/grid-separators';
import { ShapeCanon } from '../src/exact/shape-canon';

/** The cells of g in one piece with the most cells (breadth-first, written here apart from the engine). */
function largestPiece(g: Graph): number[] {
  const seen = new Uint8Array(g.vertexCount);
  let best: number[] = [];
  for (let s = 0; s < g.vertexCount; s++) {
    if (seen[s]) continue;
    const piece = [s];
    seen[s] = 1;
    for (let i = 0; i < piece.length; i++) {
      for (const w of g.neighbours(piece[i]!)) {
        if (!seen[w]) {
          seen[w] = 1;
          piece.push(w);
        }
      }
    }
    if (piece.length > best.length) best = piece;
  }
  return best;
}

/**
 * Every inclusion-minimal separator of the connected cell set, by brute force over all subsets: X is one
 * exactly when at least two components of the rest have X as their whole neighbourhood (common practice:
 * the full-component characterisation).
 */
function minimalSeparators(g: Graph, cells: number[]): string[] {
  const out: string[] = [];
  const inSet = new Map(cells.map((v, i) => [v, i]));
  for (let mask = 1; mask < (1 << cells.length) - 1; mask++) {
    const removed = (v: number) => (mask >> inSet.get(v)!) & 1;
    const label = new Map<number, number>();
    let full = 0;
    for (const s of cells) {
      if (removed(s) || label.has(s)) continue;
      const piece = [s];
      label.set(s, s);
      const touched = new Set<number>();
      for (let i = 0; i < piece.length; i++) {
        for (const w of g.neighbours(piece[i]!)) {
          if (!inSet.has(w)) continue;
          if (removed(w)) touched.add(w);
          else if (!label.has(w)) {
            label.set(w, s);
            piece.push(w);
          }
        }
      }
      let size = 0;
      for (let i = 0; i < cells.length; i++) size += (mask >> i) & 1;
      if (touched.size === size) full++;
    }
    if (full >= 2) out.push(cells.filter((v) => removed(v)).sort((a, b) => a - b).join(','));
  }
  return out;
}

function listed(g: Graph, cells: number[], maxSize: number, rectangles = new Int32Array(0)): Set<string> {
  const seen = new Set<string>();
  new GridSeparators(new ShapeCanon(g)).forEach(
    Bitset.of(g.vertexCount, cells),
    maxSize,
    rectangles,
    (found, count) => {
      const x = Array.from(found.subarray(0, count)).sort((a, b) => a - b);
      expect(x.every((v) => cells.includes(v))).toBe(true);
      expect(new Set(x).size).toBe(count);
      seen.add(x.join(','));
      return false;
    },
    () => {},
  );
  return seen;
}

function randomShape(seed: number): Graph {
  const rand = seededRandom(seed);
  const rows = 2 + Math.floor(rand() * 3);
  const cols = 3 + Math.floor(rand() * 3);
  const present = new Uint8Array(rows * cols).map(() => (rand() < 0.75 ? 1 : 0));
  present[0] = 1;
  return maskGraph({ rows, cols, present });
}

describe('GridSeparators', () => {
  // Caps keep the listing small: without rectangles it holds every king path up to the cap.
  it('lists every minimal separator of up to 5 cells of 120 random shapes with holes, against a brute force over all subsets', () => {
    let separators = 0;
    for (let seed = 1; seed <= 120; seed++) {
      const g = randomShape(seed);
      const cells = largestPiece(g);
      if (cells.length < 3 || cells.length > 15) continue;
      const seen = listed(g, cells, 5);
      for (const x of minimalSeparators(g, cells).filter((s) => s.split(',').length <= 5)) {
        expect(seen.has(x), `seed ${seed}: separator {${x}}`).toBe(true);
        separators++;
      }
    }
    expect(separators).toBeGreaterThan(500); // the check is not empty
  });

  it('lists every minimal separator of up to 5 cells of every grid with mn <= 15, and of up to 3 with a cap of 3', () => {
    for (let m = 1; m <= 5; m++) {
      for (let n = m; m * n <= 15; n++) {
        const g = gridGraph(m, n);
        const cells = Array.from({ length: m * n }, (_, v) => v);
        const all = minimalSeparators(g, cells);
        const seen = listed(g, cells, 5);
        for (const x of all.filter((s) => s.split(',').length <= 5)) expect(seen.has(x), `${m}x${n}: {${x}}`).toBe(true);
        const small = listed(g, cells, 3);
        for (const x of all.filter((s) => s.split(',').length <= 3)) expect(small.has(x), `${m}x${n} cap 3: {${x}}`).toBe(true);
        for (const x of small) expect(x.split(',').length).toBeLessThanOrEqual(3);
      }
    }
  });

  it('keeps to its rectangles: at most `slack` cells outside each, and every minimal separator that does is listed', () => {
    const g = gridGraph(3, 5);
    const cells = Array.from({ length: 15 }, (_, v) => v);
    // Rows 0-2, columns 1-3, no cell outside; columns 0-2, at most one outside.
    const rectangles = Int32Array.from([0, 2, 1, 3, 0, 0, 2, 0, 2, 1]);
    const col = (v: number) => v % 5;
    const fits = (x: number[]) => x.every((v) => col(v) >= 1 && col(v) <= 3) && x.filter((v) => col(v) > 2).length <= 1;
    const seen = listed(g, cells, 5, rectangles);
    for (const x of seen) expect(fits(x.split(',').map(Number))).toBe(true);
    const wanted = minimalSeparators(g, cells).filter((x) => x.split(',').length <= 5 && fits(x.split(',').map(Number)));
    expect(wanted.length).toBeGreaterThan(3);
    for (const x of wanted) expect(seen.has(x), `{${x}}`).toBe(true);
  });
});
