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
 * The inclusion-minimal separators of at most `cap` vertices, all taken from `among` (at most 30 of them,
 * within one piece of a graph of at most 60 vertices), by brute force over subsets as two-word bitmasks:
 * X is one exactly when at least two components of the rest have X as their whole neighbourhood (common
 * practice: the full-component characterisation). Other pieces of the graph touch no X, so never count.
 */
function smallMinimalSeparators(g: Graph, cap: number, among = Array.from({ length: g.vertexCount }, (_, v) => v)): string[] {
  const n = g.vertexCount;
  if (n > 60 || among.length > 30) throw new Error('brute force: too large');
  const bit = (v: number): [number, number] => (v < 30 ? [1 << v, 0] : [0, 1 << (v - 30)]);
  const nearLo = new Int32Array(n);
  const nearHi = new Int32Array(n);
  for (let v = 0; v < n; v++) {
    for (const w of g.neighbours(v)) {
      const [lo, hi] = bit(w);
      nearLo[v]! |= lo;
      nearHi[v]! |= hi;
    }
  }
  const allLo = n >= 30 ? (1 << 30) - 1 : (1 << n) - 1;
  const allHi = n > 30 ? (1 << (n - 30)) - 1 : 0;
  const lowest = (bits: number) => 31 - Math.clz32(bits & -bits);
  const out: string[] = [];
  const m = among.length;
  for (let k = 1; k <= Math.min(cap, m, n - 2); k++) {
    // Every k-subset of `among` in turn (Gosper's hack, common practice).
    for (let pick = (1 << k) - 1; pick < 1 << m; ) {
      let xLo = 0;
      let xHi = 0;
      for (let bits = pick; bits !== 0; bits &= bits - 1) {
        const [lo, hi] = bit(among[lowest(bits)]!);
        xLo |= lo;
        xHi |= hi;
      }
      let restLo = allLo & ~xLo;
      let restHi = allHi & ~xHi;
      let full = 0;
      while ((restLo !== 0 || restHi !== 0) && full < 2) {
        let pieceLo = restLo & -restLo;
        let pieceHi = pieceLo === 0 ? restHi & -restHi : 0;
        let frontierLo = pieceLo;
        let frontierHi = pieceHi;
        let touchedLo = 0;
        let touchedHi = 0;
        while (frontierLo !== 0 || frontierHi !== 0) {
          let v: number;
          if (frontierLo !== 0) {
            v = lowest(frontierLo);
            frontierLo &= frontierLo - 1;
          } else {
            v = 30 + lowest(frontierHi);
            frontierHi &= frontierHi - 1;
          }
          const growLo = nearLo[v]! & ~xLo & ~pieceLo;
          const growHi = nearHi[v]! & ~xHi & ~pieceHi;
          touchedLo |= nearLo[v]! & xLo;
          touchedHi |= nearHi[v]! & xHi;
          pieceLo |= growLo;
          pieceHi |= growHi;
          frontierLo |= growLo;
          frontierHi |= growHi;
        }
        restLo &= ~pieceLo;
        restHi &= ~pieceHi;
        if (touchedLo === xLo && touchedHi === xHi) full++;
      }
      if (full >= 2) {
        const x: number[] = [];
        for (let bits = pick; bits !== 0; bits &= bits - 1) x.push(among[lowest(bits)]!);
        out.push(x.sort((p, q) => p - q).join(','));
      }
      const low = pick & -pick;
      const r = pick + low;
      pick = (((r ^ pick) >>> 2) / low) | r;
    }
  }
  return out;
}

/** A random connected mask of rows x cols with about `fill` of its cells (retried until it is in one piece). */
function connectedMask(rand: () => number, rows: number, cols: number, fill: number): Graph {
  for (;;) {
    const g = maskGraph({ rows, cols, present: new Uint8Array(rows * cols).map(() => (rand() < fill ? 1 : 0)) });
    if (g.vertexCount >= 4 && largestPiece(g).length === g.vertexCount) return g;
  }
}

/** Whether vertex v of a shape has all eight king neighbours in it (so no missing region's face is near). */
function deepInside(g: Graph, v: number): boolean {
  const { rows, cols, cells } = g.layout!;
  const r = Math.floor(cells[v]! / cols);
  const c = cells[v]! % cols;
  for (let dr = -1; dr <= 1; dr++) {
    for (let dc = -1; dc <= 1; dc++) {
      const rr = r + dr;
      const cc = c + dc;
      if (rr < 0 || cc < 0 || rr >= rows || cc >= cols || !Array.from(cells).includes(rr * cols + cc)) return false;
    }
  }
  return true;
}

function listed(g: Graph, cells: number[], maxSize: number, rectangles = new Int32Array(0)): Set<string> {
  const seen = new Set<string>();
  const inShape = new Set(cells);
  const wrong: string[] = [];
  new GridSeparators(new ShapeCanon(g)).forEach(
    Bitset.of(g.vertexCount, cells),
    maxSize,
    rectangles,
    (found, count) => {
      const x = Array.from(found.subarray(0, count)).sort((a, b) => a - b);
      // Collected and asserted once at the end: listings run to 10^5 sets.
      if (!x.every((v) => inShape.has(v)) || new Set(x).size !== count) wrong.push(x.join(','));
      seen.add(x.join(','));
      return false;
    },
    () => {},
  );
  expect(wrong, 'sets with a cell outside the shape or a cell twice').toEqual([]);
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
      for (const x of smallMinimalSeparators(g, 5, cells)) {
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
        const all = smallMinimalSeparators(g, 5, cells);
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
    const wanted = smallMinimalSeparators(g, 5, cells).filter((x) => fits(x.split(',').map(Number)));
    expect(wanted.length).toBeGreaterThan(3);
    for (const x of wanted) expect(seen.has(x), `{${x}}`).toBe(true);
  });
  it('lists every minimal separator of up to 7 cells of the 5 x 6 grid and of 12 random 5 x 6 masks', () => {
    const rand = seededRandom(2026);
    const shapes = [gridGraph(5, 6), ...Array.from({ length: 12 }, () => connectedMask(rand, 5, 6, 0.85))];
    let separators = 0;
    for (const [i, g] of shapes.entries()) {
      const seen = listed(g, Array.from({ length: g.vertexCount }, (_, v) => v), 7);
      for (const x of smallMinimalSeparators(g, 7)) {
        expect(seen.has(x), `shape ${i}: separator {${x}}`).toBe(true);
        separators++;
      }
    }
    expect(separators).toBeGreaterThan(4000);
  });

  // A separator that stays clear of every missing region is a closed king cycle (no region to jump
  // through): these shapes have room for many, up to 8 cells.
  it('lists every minimal separator of up to 8 cells clear of the missing regions, on grids up to 7 x 7 and masks with holes', () => {
    const rand = seededRandom(31);
    const holed = (rows: number, cols: number, gone: number[]) =>
      maskGraph({ rows, cols, present: new Uint8Array(rows * cols).map((_, p) => (gone.includes(p) ? 0 : 1)) });
    const shapes = [gridGraph(6, 6), gridGraph(6, 7), holed(7, 7, [24]), holed(7, 8, [26, 27]), connectedMask(rand, 7, 7, 0.95), connectedMask(rand, 7, 8, 0.95)];
    let rings = 0;
    for (const [i, g] of shapes.entries()) {
      const deep = Array.from({ length: g.vertexCount }, (_, v) => v).filter((v) => deepInside(g, v));
      const seen = listed(g, Array.from({ length: g.vertexCount }, (_, v) => v), 8);
      for (const x of smallMinimalSeparators(g, 8, deep.slice(0, 30))) {
        expect(seen.has(x), `shape ${i}: separator {${x}}`).toBe(true);
        rings++;
      }
    }
    expect(rings).toBeGreaterThan(100);
  });

  it('keeps to many rectangles at once (four to a word), and lists every minimal separator that does', () => {
    const rand = seededRandom(77);
    let wanted = 0;
    for (let round = 0; round < 8; round++) {
      const g = round === 0 ? gridGraph(5, 6) : connectedMask(rand, 5, 6, 0.85);
      const boxes: number[] = [];
      for (let i = 0; i < 11; i++) {
        const r0 = Math.floor(rand() * 3);
        const c0 = Math.floor(rand() * 3);
        const r1 = r0 + 1 + Math.floor(rand() * (4 - r0));
        const c1 = c0 + 1 + Math.floor(rand() * (5 - c0));
        // One rectangle with no slack in some rounds; one that cannot bind (more slack than a lane holds).
        const slack = i === 0 && round % 2 === 1 ? 0 : i === 1 ? 200 : 1 + Math.floor(rand() * 4);
        boxes.push(r0, r1, c0, c1, slack);
      }
      const { cols, cells: at } = g.layout!;
      const fits = (x: number[]) => {
        for (let i = 0; i < boxes.length; i += 5) {
          const outside = x.filter((v) => {
            const r = Math.floor(at[v]! / cols);
            const c = at[v]! % cols;
            return r < boxes[i]! || r > boxes[i + 1]! || c < boxes[i + 2]! || c > boxes[i + 3]!;
          }).length;
          if (outside > boxes[i + 4]!) return false;
        }
        return true;
      };
      const cells = Array.from({ length: g.vertexCount }, (_, v) => v);
      const seen = listed(g, cells, 6, Int32Array.from(boxes));
      for (const x of seen) expect(fits(x.split(',').map(Number)), `round ${round}: {${x}}`).toBe(true);
      for (const x of smallMinimalSeparators(g, 6)) {
        if (!fits(x.split(',').map(Number))) continue;
        expect(seen.has(x), `round ${round}: separator {${x}}`).toBe(true);
        wanted++;
      }
    }
    expect(wanted).toBeGreaterThan(20);
  });
});
