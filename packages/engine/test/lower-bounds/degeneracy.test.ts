import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { completeGraph, cycleGraph, graphFromEdges, gridGraph, randomTree } from '../../src/index';
import { checkLowerBoundWitness, coreDecomposition, degeneracyBound } from '../../src/bounds/lower/index';
import { arbitrarySmallGraph, degeneracyByDefinition, naiveDegeneracy } from './support';

describe('degeneracyBound', () => {
  it('agrees with a naive repeated-minimum-degree computation, and its core checks', () => {
    fc.assert(
      fc.property(arbitrarySmallGraph(14), (g) => {
        const b = degeneracyBound(g);
        if (b.witness.kind !== 'degeneracy') throw new Error('wrong witness kind');
        expect(b.witness.degeneracy).toBe(naiveDegeneracy(g));
        expect(b.value).toBe(b.witness.degeneracy + 1);
        expect(checkLowerBoundWitness(g, b)).toEqual({ ok: true });
      }),
      { numRuns: 1000 },
    );
  });

  it('agrees with the definition (largest minimum degree of an induced subgraph) for n <= 11', () => {
    fc.assert(
      fc.property(arbitrarySmallGraph(11), (g) => {
        expect(coreDecomposition(g).degeneracy).toBe(degeneracyByDefinition(g));
      }),
      { numRuns: 1000 },
    );
  });

  it('gives a degeneracy order: each vertex has at most its core number of later neighbours, core numbers never fall', () => {
    fc.assert(
      fc.property(arbitrarySmallGraph(14), (g) => {
        const { order, position, core } = coreDecomposition(g);
        expect([...order].sort((a, b) => a - b)).toEqual(Array.from({ length: g.vertexCount }, (_, i) => i));
        for (let i = 0; i < order.length; i++) {
          const v = order[i]!;
          expect(position[v]).toBe(i);
          const later = [...g.neighbours(v)].filter((w) => position[w]! > i).length;
          expect(later).toBeLessThanOrEqual(core[v]!);
          if (i > 0) expect(core[v]).toBeGreaterThanOrEqual(core[order[i - 1]!]!);
        }
      }),
      { numRuns: 1000 },
    );
  });

  it('known values: trees 1, cycles and grids 2, K_n n − 1, edgeless 0', () => {
    expect(degeneracyBound(randomTree(1000, 5)).value).toBe(2);
    expect(degeneracyBound(cycleGraph(50)).value).toBe(3);
    const grid = degeneracyBound(gridGraph(40, 50));
    expect(grid).toMatchObject({ value: 3, witness: { degeneracy: 2 } });
    expect(grid.witness.kind === 'degeneracy' && grid.witness.core.length).toBe(2000); // a grid is its own 2-core
    expect(degeneracyBound(completeGraph(9)).value).toBe(9);
    expect(degeneracyBound(graphFromEdges(6, [])).value).toBe(1);
    expect(degeneracyBound(graphFromEdges(0, []))).toMatchObject({ value: 0, witness: { core: [] } });
  });

  it('finds a dense core inside a sparse graph: K_6 hanging off a long path', () => {
    const pairs: number[] = [];
    for (let i = 0; i + 1 < 100; i++) pairs.push(i, i + 1);
    for (let u = 100; u < 106; u++) for (let v = u + 1; v < 106; v++) pairs.push(u, v);
    pairs.push(99, 100);
    const g = graphFromEdges(106, pairs);
    const b = degeneracyBound(g);
    expect(b).toMatchObject({ value: 6, witness: { kind: 'degeneracy', degeneracy: 5, core: [100, 101, 102, 103, 104, 105] } });
  });
});
