import { describe, expect, it } from 'vitest';
import { completeGraph, cycleGraph, graphFromEdges, gridGraph, pathGraph, staircaseGraph } from '../../src/index';
import {
  checkLowerBoundWitness,
  degeneracyBound,
  minorMinWidthBound,
  type LowerBound,
  type LowerBoundWitness,
} from '../../src/bounds/lower/index';
import { maskFrom } from './support';

const bound = (value: number, witness: LowerBoundWitness): LowerBound => ({ value, witness, argument: 'test' });
const rejects = (g: Parameters<typeof checkLowerBoundWitness>[0], b: LowerBound, why: string) => {
  const verdict = checkLowerBoundWitness(g, b);
  expect(verdict.ok, JSON.stringify(b.witness)).toBe(false);
  if (!verdict.ok) expect(verdict.reason).toContain(why);
};

describe('checkLowerBoundWitness', () => {
  it('trivial: 1 for a graph with a vertex, 0 for the empty graph', () => {
    expect(checkLowerBoundWitness(pathGraph(1), bound(1, { kind: 'trivial' }))).toEqual({ ok: true });
    rejects(pathGraph(3), bound(2, { kind: 'trivial' }), 'exceeds');
    rejects(graphFromEdges(0, []), bound(1, { kind: 'trivial' }), 'exceeds');
  });

  it('path: consecutive vertices adjacent, none repeated, value at most ⌊log2 k⌋ + 1', () => {
    const g = pathGraph(8);
    expect(checkLowerBoundWitness(g, bound(4, { kind: 'path', vertices: [0, 1, 2, 3, 4, 5, 6, 7] }))).toEqual({ ok: true });
    expect(checkLowerBoundWitness(g, bound(3, { kind: 'path', vertices: [0, 1, 2, 3, 4, 5, 6, 7] }))).toEqual({ ok: true }); // weaker is fine
    rejects(g, bound(4, { kind: 'path', vertices: [0, 1, 2, 3, 4, 5, 6] }), 'exceeds');
    rejects(g, bound(3, { kind: 'path', vertices: [0, 1, 3, 4] }), 'not adjacent');
    rejects(g, bound(2, { kind: 'path', vertices: [0, 1, 0] }), 'twice');
    rejects(g, bound(1, { kind: 'path', vertices: [9] }), 'not a vertex');
    rejects(g, bound(1.5, { kind: 'path', vertices: [0, 1] }), 'whole number');
  });

  it('clique: every two adjacent', () => {
    expect(checkLowerBoundWitness(completeGraph(5), bound(5, { kind: 'clique', vertices: [0, 1, 2, 3, 4] }))).toEqual({ ok: true });
    rejects(cycleGraph(4), bound(3, { kind: 'clique', vertices: [0, 1, 2] }), 'not adjacent');
  });

  it('degeneracy: each core vertex has >= d neighbours inside the core', () => {
    const g = cycleGraph(6);
    expect(checkLowerBoundWitness(g, bound(3, { kind: 'degeneracy', degeneracy: 2, core: [0, 1, 2, 3, 4, 5] }))).toEqual({ ok: true });
    rejects(g, bound(3, { kind: 'degeneracy', degeneracy: 2, core: [0, 1, 2] }), 'fewer than 2');
    rejects(g, bound(4, { kind: 'degeneracy', degeneracy: 3, core: [0, 1, 2, 3, 4, 5] }), 'fewer than 3');
    rejects(g, bound(1, { kind: 'degeneracy', degeneracy: 0, core: [] }), 'exceeds');
  });

  it('minor-min-width: contractions along edges of the current minor, then minimum degree >= width', () => {
    const g = gridGraph(4, 4);
    const real = minorMinWidthBound(g);
    expect(checkLowerBoundWitness(g, real)).toEqual({ ok: true });
    const w = real.witness.kind === 'minor-min-width' ? real.witness : undefined!;
    rejects(g, bound(w.width + 2, { ...w, width: w.width + 1 }), 'exceeds');
    rejects(g, bound(2, { kind: 'minor-min-width', width: 1, contractions: [[0, 5]] }), 'not adjacent');
    rejects(g, bound(2, { kind: 'minor-min-width', width: 1, contractions: [[0, 1], [0, 4]] }), 'no vertex of the minor');
    // Merging 0 into 1 in C_4 leaves a triangle (1 takes 0's edge to 3): minimum degree 2, not 3.
    expect(checkLowerBoundWitness(cycleGraph(4), bound(3, { kind: 'minor-min-width', width: 2, contractions: [[0, 1]] }))).toEqual({ ok: true });
    rejects(cycleGraph(4), bound(4, { kind: 'minor-min-width', width: 3, contractions: [[0, 1]] }), 'exceeds');
  });

  it('rectangle: cells present and joined, value matching its closed form', () => {
    const g = gridGraph(3, 5);
    expect(checkLowerBoundWitness(g, bound(5, { kind: 'rectangle', row: 1, col: 0, rows: 2, cols: 5, value: 5, provenance: 'formula:grid-2xn' }))).toEqual({ ok: true });
    rejects(g, bound(6, { kind: 'rectangle', row: 1, col: 0, rows: 2, cols: 5, value: 6, provenance: 'formula:grid-2xn' }), 'gives 5');
    rejects(g, bound(5, { kind: 'rectangle', row: 0, col: 0, rows: 3, cols: 5, value: 5, provenance: 'formula:grid-2xn' }), 'does not apply');
    rejects(g, bound(5, { kind: 'rectangle', row: 2, col: 0, rows: 2, cols: 5, value: 5, provenance: 'formula:grid-2xn' }), 'leaves');
    const holes = maskFrom('#####', '##.##');
    rejects(holes, bound(5, { kind: 'rectangle', row: 0, col: 0, rows: 2, cols: 5, value: 5, provenance: 'formula:grid-2xn' }), 'not a vertex');
    // A table value is taken as given without the table, and re-asked with it.
    const claim = bound(6, { kind: 'rectangle', row: 0, col: 0, rows: 3, cols: 5, value: 6, provenance: 'atlas' });
    expect(checkLowerBoundWitness(g, claim)).toMatchObject({ ok: true, assumes: expect.stringContaining('atlas') });
    expect(checkLowerBoundWitness(g, claim, { knownRectangle: () => ({ value: 6, provenance: 'atlas' }) })).toEqual({ ok: true });
    expect(checkLowerBoundWitness(g, claim, { knownRectangle: () => ({ value: 5, provenance: 'atlas' }) })).toMatchObject({ ok: false });
    expect(checkLowerBoundWitness(g, claim, { knownRectangle: () => undefined })).toMatchObject({ ok: false });
    rejects(pathGraph(4), bound(2, { kind: 'rectangle', row: 0, col: 0, rows: 1, cols: 2, value: 2, provenance: 'formula:path' }), 'no grid layout');
  });

  it('rectangle: a layout whose cells are not joined is caught', () => {
    const g = graphFromEdges(4, [0, 1, 2, 3], undefined, { rows: 2, cols: 2, cells: Int32Array.from([0, 1, 2, 3]) });
    rejects(g, bound(3, { kind: 'rectangle', row: 0, col: 0, rows: 2, cols: 2, value: 3, provenance: 'formula:grid-2xn' }), 'not joined');
  });

  it('staircase: some orientation fits the box, value by its path or the table', () => {
    const g = staircaseGraph(4);
    expect(checkLowerBoundWitness(g, bound(3, { kind: 'staircase', row: 0, col: 0, t: 4, value: 3, provenance: 'formula:path on 2t-1 cells' }))).toEqual({ ok: true });
    rejects(g, bound(4, { kind: 'staircase', row: 0, col: 0, t: 4, value: 4, provenance: 'formula:path on 2t-1 cells' }), 'gives 3');
    rejects(g, bound(3, { kind: 'staircase', row: 0, col: 0, t: 5, value: 3, provenance: 'formula:path on 2t-1 cells' }), 'no orientation');
    const flipped = maskFrom('...#', '..##', '.###', '####');
    expect(checkLowerBoundWitness(flipped, bound(3, { kind: 'staircase', row: 0, col: 0, t: 4, value: 3, provenance: 'formula:path on 2t-1 cells' }))).toEqual({ ok: true });
  });

  it('accepts what the bounds themselves produce', () => {
    const g = gridGraph(6, 7);
    expect(checkLowerBoundWitness(g, degeneracyBound(g))).toEqual({ ok: true });
  });
});
