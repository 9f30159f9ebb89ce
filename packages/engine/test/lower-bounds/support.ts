// Shared helpers for the lower-bound tests: generators, and checks written independently of the engine.
import fc from 'fast-check';
import { graphFromEdges, gridGraph, maskGraph, randomGraph, staircaseGraph, type Graph } from '../../src/index';
import type { KnownRectangleValues, KnownStaircaseValues } from '../../src/bounds/lower/index';
import { bruteForceTreeDepth } from '../brute-force-td';

/** Random simple graphs on 1..maxN vertices: a random pair list (sparse to dense), or G(n, p). */
export const arbitrarySmallGraph = (maxN = 14): fc.Arbitrary<Graph> =>
  fc.oneof(
    fc
      .integer({ min: 1, max: maxN })
      .chain((n) => fc.array(fc.tuple(fc.nat(n - 1), fc.nat(n - 1)), { maxLength: (n * (n - 1)) / 2 + 3 }).map((pairs) => graphFromEdges(n, pairs.flat()))),
    fc
      // p in whole percent: randomGraph's geometric skips need log(1 − p) away from 0.
      .record({ n: fc.integer({ min: 1, max: maxN }), percent: fc.integer({ min: 0, max: 100 }), seed: fc.nat() })
      .map(({ n, percent, seed }) => randomGraph(n, percent / 100, seed)),
  );

/**
 * A random mask of at most maxCells cells in a rows x cols box (rows * cols <= maxCells): each cell is
 * present with a random density of 40–100%, and at least one is.
 */
export const arbitraryMask = (maxCells = 20): fc.Arbitrary<Graph> =>
  fc
    .integer({ min: 1, max: Math.min(maxCells, 6) })
    .chain((rows) => fc.record({ rows: fc.constant(rows), cols: fc.integer({ min: 1, max: Math.floor(maxCells / rows) }) }))
    .chain(({ rows, cols }) =>
      fc
        .tuple(fc.integer({ min: 40, max: 100 }), fc.array(fc.integer({ min: 0, max: 99 }), { minLength: rows * cols, maxLength: rows * cols }), fc.nat(rows * cols - 1))
        .map(([density, rolls, keep]) => {
          const present = Uint8Array.from(rolls, (x) => (x < density ? 1 : 0));
          present[keep] = 1; // a mask needs a cell
          return maskGraph({ rows, cols, present });
        }),
    );

/** A mask from text rows of '#' (cell) and '.' (hole). */
export function maskFrom(...lines: string[]): Graph {
  const rows = lines.length;
  const cols = lines[0]!.length;
  const present = new Uint8Array(rows * cols);
  lines.forEach((line, r) => [...line].forEach((ch, c) => (present[r * cols + c] = ch === '#' ? 1 : 0)));
  return maskGraph({ rows, cols, present });
}

const tdCache = new Map<string, number>();
/** Brute-force tree-depth, cached by a key the caller names. */
export function cachedTd(key: string, build: () => Graph): number {
  let v = tdCache.get(key);
  if (v === undefined) tdCache.set(key, (v = bruteForceTreeDepth(build())));
  return v;
}

/** A table of full-grid rank numbers by brute force, as an atlas would give them (cells <= maxCells). */
export const bruteRectangleTable =
  (maxCells = 20): KnownRectangleValues =>
  (rows, cols) => {
    if (rows > cols) throw new Error(`the table is asked canonically, got ${rows} x ${cols}`);
    if (rows * cols > maxCells) return undefined;
    return { value: cachedTd(`grid ${rows}x${cols}`, () => gridGraph(rows, cols)), provenance: 'test:brute-force' };
  };

/** A table of staircase rank numbers by brute force (t <= maxT). */
export const bruteStaircaseTable =
  (maxT = 5): KnownStaircaseValues =>
  (t) =>
    t <= maxT ? { value: cachedTd(`staircase ${t}`, () => staircaseGraph(t)), provenance: 'test:brute-force' } : undefined;

/** Adjacency bitmasks of a graph on <= 31 vertices. */
export function adjacencyMasks(g: Graph): number[] {
  const adj = new Array<number>(g.vertexCount).fill(0);
  for (const [u, v] of g.edges()) {
    adj[u]! |= 1 << v;
    adj[v]! |= 1 << u;
  }
  return adj;
}

/** The clique number by trying every vertex subset (n <= 20). */
export function bruteForceCliqueNumber(g: Graph): number {
  const n = g.vertexCount;
  const adj = adjacencyMasks(g);
  let best = 0;
  for (let s = 1; s < 1 << n; s++) {
    let ok = true;
    for (let v = 0; v < n && ok; v++) if (s & (1 << v) && (s & ~adj[v]! & ~(1 << v)) !== 0) ok = false;
    if (ok) best = Math.max(best, popcount(s));
  }
  return best;
}

function popcount(x: number): number {
  let c = 0;
  for (; x; x &= x - 1) c++;
  return c;
}

/** Degeneracy the naive way: remove a vertex of least remaining degree n times, keep the largest degree seen. */
export function naiveDegeneracy(g: Graph): number {
  const left = new Set<number>(Array.from({ length: g.vertexCount }, (_, v) => v));
  const degreeIn = (v: number) => [...g.neighbours(v)].filter((w) => left.has(w)).length;
  let d = 0;
  while (left.size) {
    let low = -1;
    for (const v of left) if (low < 0 || degreeIn(v) < degreeIn(low)) low = v;
    d = Math.max(d, degreeIn(low));
    left.delete(low);
  }
  return d;
}

/** Degeneracy by its definition: the largest minimum degree of an induced subgraph (every subset, n <= 12). */
export function degeneracyByDefinition(g: Graph): number {
  const n = g.vertexCount;
  const adj = adjacencyMasks(g);
  let best = 0;
  for (let s = 1; s < 1 << n; s++) {
    let low = Infinity;
    for (let v = 0; v < n; v++) if (s & (1 << v)) low = Math.min(low, popcount(adj[v]! & s));
    best = Math.max(best, low);
  }
  return best;
}
