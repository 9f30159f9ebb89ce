import { describe, expect, it } from 'vitest';
import { graphFromEdges } from '../src/index';

describe('graphFromEdges', () => {
  it('drops loops, merges parallel edges and sorts neighbours', () => {
    const g = graphFromEdges(4, [2, 0, 0, 2, 1, 1, 3, 0, 0, 1]);
    expect(g.vertexCount).toBe(4);
    expect(g.edgeCount).toBe(3);
    expect(Array.from(g.neighbours(0))).toEqual([1, 2, 3]);
    expect(g.degree(1)).toBe(1);
  });

  it('rejects an edge that names a missing vertex', () => {
    expect(() => graphFromEdges(3, [0, 3])).toThrow(/outside 0..2/);
  });
});
