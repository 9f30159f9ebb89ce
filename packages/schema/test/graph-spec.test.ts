import { describe, expect, it } from 'vitest';
import { GraphSpec } from '../src/index';

describe('GraphSpec (JSON form)', () => {
  it('accepts each family with sensible sizes', () => {
    for (const spec of [
      { family: 'grid', rows: 4, cols: 7 },
      { family: 'cylinder', rows: 4, cols: 6 },
      { family: 'torus', rows: 4, cols: 4 },
      { family: 'staircase', t: 6 },
      { family: 'path', n: 10 },
      { family: 'cycle', n: 9 },
      { family: 'complete', n: 5 },
      { family: 'bipartite', a: 3, b: 4 },
      { family: 'star', leaves: 8 },
      { family: 'random-tree', n: 100, seed: 7 },
      { family: 'gnp', n: 60, p: 0.1, seed: 7 },
      { family: 'mask', text: '##.\n###\n' },
      { family: 'tree', parents: [-1, 0, 0] },
      { family: 'upload', graphId: '0b6f0d3e-8a5c-4d2e-9a41-3c2b1f6e7d80' },
    ]) {
      expect(GraphSpec.safeParse(spec).success, JSON.stringify(spec)).toBe(true);
    }
  });

  it('rejects zero, negative, fractional and oversized sizes, naming the field', () => {
    const issue = (spec: unknown) => {
      const r = GraphSpec.safeParse(spec);
      return r.success ? undefined : r.error.issues[0];
    };
    expect(issue({ family: 'grid', rows: 0, cols: 4 })).toMatchObject({ path: ['rows'] });
    expect(issue({ family: 'grid', rows: -3, cols: 4 })?.message).toMatch(/at least 1/);
    expect(issue({ family: 'grid', rows: 2.5, cols: 4 })?.message).toMatch(/whole number/);
    expect(issue({ family: 'grid', rows: 100_000, cols: 100_000 })?.message).toMatch(/more than/);
    expect(issue({ family: 'grid', rows: '4', cols: 4 })?.message).toMatch(/must be a number/);
    expect(issue({ family: 'cycle', n: 2 })?.message).toMatch(/at least 3/);
    expect(issue({ family: 'mask', text: 'ab' })?.message).toMatch(/'#' for a cell/);
    expect(issue({ family: 'hexagon', n: 4 })).toBeDefined();
  });
});
