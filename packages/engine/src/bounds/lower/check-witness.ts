import { floorLog2, pathRankNumber } from '../../formulas/closed-forms';
import type { Graph } from '../../graph/graph';
import type { LowerBound, LowerBoundWitness } from '../lower-bound';
import { cellsFailToFormGrid, layoutPicture, type KnownRectangleValues, type KnownStaircaseValues } from './grid-shape';
import { RECTANGLE_GRID2_PROVENANCE, RECTANGLE_PATH_PROVENANCE, rectangleClosedForm } from './rectangle';
import { inStaircase, STAIRCASE_ORIENTATIONS, STAIRCASE_PATH_PROVENANCE } from './staircase';

/**
 * The verdict on a lower bound: ok, or the first thing found wrong. `assumes` names what could not be
 * re-checked against the graph alone (a value from a table or from another computation).
 */
export type WitnessVerdict = { ok: true; assumes?: string } | { ok: false; reason: string };

export interface CheckOptions {
  /** When given, rectangle values with other provenances are checked against it too. */
  knownRectangle?: KnownRectangleValues;
  /** When given, staircase values from a table are checked against it too. */
  knownStaircase?: KnownStaircaseValues;
}

/** What a witness proves, or why it proves nothing. */
type Implied = { value: number; assumes?: string } | { reason: string };

/**
 * Re-checks a lower bound against g from scratch, trusting nothing the bound's code computed: the path
 * is a path, the clique a clique, the core has minimum degree >= d inside, the contractions replay along
 * edges to a minor whose `width`-core is not empty, the rectangle or staircase cells are vertices joined
 * as a grid and their value matches the closed form their provenance names. Then the bound's value must
 * not exceed what the witness proves.
 */
export function checkLowerBoundWitness(g: Graph, bound: LowerBound, options: CheckOptions = {}): WitnessVerdict {
  if (!Number.isInteger(bound.value) || bound.value < 0) return { ok: false, reason: `the value ${bound.value} is not a whole number >= 0` };
  const implied = provenValue(g, bound.witness, options);
  if ('reason' in implied) return { ok: false, reason: implied.reason };
  if (bound.value > implied.value) return { ok: false, reason: `the value ${bound.value} exceeds the ${implied.value} the ${bound.witness.kind} witness proves` };
  return implied.assumes ? { ok: true, assumes: implied.assumes } : { ok: true };
}

function provenValue(g: Graph, w: LowerBoundWitness, options: CheckOptions): Implied {
  const n = g.vertexCount;
  switch (w.kind) {
    case 'trivial':
      return { value: n > 0 ? 1 : 0 };
    case 'path': {
      const bad = badVertexList(n, w.vertices);
      if (bad) return { reason: `path: ${bad}` };
      for (let i = 0; i + 1 < w.vertices.length; i++) {
        if (!g.hasEdge(w.vertices[i]!, w.vertices[i + 1]!)) return { reason: `path: ${w.vertices[i]} and ${w.vertices[i + 1]} are not adjacent` };
      }
      return { value: w.vertices.length ? floorLog2(w.vertices.length) + 1 : 0 };
    }
    case 'clique': {
      const bad = badVertexList(n, w.vertices);
      if (bad) return { reason: `clique: ${bad}` };
      for (let i = 0; i < w.vertices.length; i++) {
        for (let j = i + 1; j < w.vertices.length; j++) {
          if (!g.hasEdge(w.vertices[i]!, w.vertices[j]!)) return { reason: `clique: ${w.vertices[i]} and ${w.vertices[j]} are not adjacent` };
        }
      }
      return { value: w.vertices.length };
    }
    case 'degeneracy': {
      if (!Number.isInteger(w.degeneracy) || w.degeneracy < 0) return { reason: `degeneracy: ${w.degeneracy} is not a whole number >= 0` };
      const bad = badVertexList(n, w.core);
      if (bad) return { reason: `degeneracy: core: ${bad}` };
      const inCore = new Uint8Array(n);
      for (const v of w.core) inCore[v] = 1;
      for (const v of w.core) {
        let inside = 0;
        for (let e = g.offsets[v]!, end = g.offsets[v + 1]!; e < end; e++) inside += inCore[g.targets[e]!]!;
        if (inside < w.degeneracy) return { reason: `degeneracy: core vertex ${v} has ${inside} neighbours in the core, fewer than ${w.degeneracy}` };
      }
      return { value: w.core.length ? w.degeneracy + 1 : 0 };
    }
    case 'minor-min-width':
      return replayContractions(g, w.width, w.contractions);
    case 'rectangle': {
      const shape = layoutPicture(g);
      if (typeof shape === 'string') return { reason: `rectangle: ${shape}` };
      const { row, col, rows, cols } = w;
      if (![row, col, rows, cols].every(Number.isInteger)) return { reason: 'rectangle: its position and size must be whole numbers' };
      const gap = cellsFailToFormGrid(g, shape, row, col, rows, cols, () => true);
      if (gap) return { reason: `rectangle: ${gap}` };
      if (w.provenance === RECTANGLE_PATH_PROVENANCE || w.provenance === RECTANGLE_GRID2_PROVENANCE) {
        const form = rectangleClosedForm(rows, cols);
        if (!form || form.provenance !== w.provenance) return { reason: `rectangle: ${w.provenance} does not apply to a ${rows} x ${cols} grid` };
        if (form.value !== w.value) return { reason: `rectangle: ${w.provenance} gives ${form.value} for ${rows} x ${cols}, not ${w.value}` };
        return { value: w.value };
      }
      return tableValue(`rectangle ${Math.min(rows, cols)} x ${Math.max(rows, cols)}`, w.value, w.provenance, options.knownRectangle && (() => options.knownRectangle!(Math.min(rows, cols), Math.max(rows, cols))));
    }
    case 'staircase': {
      const shape = layoutPicture(g);
      if (typeof shape === 'string') return { reason: `staircase: ${shape}` };
      const { row, col, t } = w;
      if (![row, col, t].every(Number.isInteger) || t < 1) return { reason: 'staircase: its position must be whole numbers and t >= 1' };
      let gap: string | undefined = 'no orientation fits';
      for (const { dr, dc } of STAIRCASE_ORIENTATIONS) {
        gap = cellsFailToFormGrid(g, shape, row, col, t, t, (r, c) => inStaircase(t, row, col, dr, dc, r, c));
        if (!gap) break;
      }
      if (gap) return { reason: `staircase: no orientation of S(${t}) fits the box at (${row}, ${col}); the last tried: ${gap}` };
      if (w.provenance === STAIRCASE_PATH_PROVENANCE) {
        const value = pathRankNumber(2 * t - 1);
        if (w.value !== value) return { reason: `staircase: a path on ${2 * t - 1} cells gives ${value}, not ${w.value}` };
        return { value };
      }
      return tableValue(`staircase S(${t})`, w.value, w.provenance, options.knownStaircase && (() => options.knownStaircase!(t)));
    }
    case 'vertex-removed': {
      if (!Number.isInteger(w.vertex) || w.vertex < 0 || w.vertex >= n) return { reason: `vertex-removed: ${w.vertex} is not a vertex` };
      if (!Number.isInteger(w.value) || w.value < 0 || w.value > n - 1) return { reason: `vertex-removed: ${w.value} is no possible rank number of a graph on ${n - 1} vertices` };
      return { value: w.value, assumes: `χr(G − ${w.vertex}) >= ${w.value} (${w.provenance}), taken as given` };
    }
  }
}

/** A table's value: re-asked when the table is at hand, else taken as given and said so. */
function tableValue(what: string, value: number, provenance: string, ask: (() => { value: number; provenance: string } | undefined) | undefined): Implied {
  if (!Number.isInteger(value) || value < 0) return { reason: `${what}: the value ${value} is not a whole number >= 0` };
  if (!ask) return { value, assumes: `χr(${what}) = ${value} (${provenance}), taken as given` };
  const k = ask();
  if (!k) return { reason: `${what}: the table has no value` };
  if (k.value < value) return { reason: `${what}: the table gives ${k.value}, less than the ${value} claimed` };
  return { value };
}

/** Why a list is not a list of distinct vertices of a graph on n vertices, or undefined. */
function badVertexList(n: number, vertices: readonly number[]): string | undefined {
  const seen = new Set<number>();
  for (const v of vertices) {
    if (!Number.isInteger(v) || v < 0 || v >= n) return `${v} is not a vertex`;
    if (seen.has(v)) return `vertex ${v} appears twice`;
    seen.add(v);
  }
  return undefined;
}

/**
 * Replays the contractions [v, u] (v merged into u, along an edge of the current minor) and then peels
 * vertices of degree < width; what remains is a minor of g with minimum degree >= width, so
 * td >= width + 1. Vertices the run deleted when isolated are peeled here as degree 0.
 */
function replayContractions(g: Graph, width: number, contractions: readonly [number, number][]): Implied {
  const n = g.vertexCount;
  if (!Number.isInteger(width) || width < 0) return { reason: `minor-min-width: ${width} is not a whole number >= 0` };
  const alive = new Uint8Array(n).fill(1);
  const sets = new Map<number, Set<number>>();
  const adj = (v: number): Set<number> => {
    let s = sets.get(v);
    if (!s) sets.set(v, (s = new Set(g.neighbours(v))));
    return s;
  };
  for (let i = 0; i < contractions.length; i++) {
    const [v, u] = contractions[i]!;
    for (const x of [v, u]) if (!Number.isInteger(x) || x < 0 || x >= n || !alive[x]) return { reason: `minor-min-width: contraction ${i} names ${x}, which is no vertex of the minor` };
    if (v === u || !adj(v).has(u)) return { reason: `minor-min-width: contraction ${i}: ${v} and ${u} are not adjacent in the minor` };
    const nu = adj(u);
    for (const x of adj(v)) {
      const nx = adj(x);
      nx.delete(v);
      if (x !== u) {
        nx.add(u);
        nu.add(x);
      }
    }
    alive[v] = 0;
    sets.delete(v);
  }
  // Peel to the width-core.
  const degree = new Int32Array(n);
  const queue: number[] = [];
  let left = 0;
  for (let v = 0; v < n; v++) {
    if (!alive[v]) continue;
    left++;
    degree[v] = sets.get(v)?.size ?? g.degree(v);
    if (degree[v]! < width) {
      alive[v] = 0;
      queue.push(v);
    }
  }
  while (queue.length) {
    const v = queue.pop()!;
    left--;
    for (const x of adj(v)) {
      if (alive[x] && --degree[x]! < width) {
        alive[x] = 0;
        queue.push(x);
      }
    }
  }
  return { value: left > 0 ? width + 1 : 0 };
}
