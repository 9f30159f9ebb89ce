import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ChildCombiner } from '../../src/edge/combine-children';
import { WideChildCombiner } from '../../src/edge/combine-children-wide';

/** What a child with visible set a can show through its edge: a above bit j, plus bit j, for each clear bit j of a. */
function candidates(a: number, bits: number): number[] {
  const out: number[] = [];
  for (let j = 0; j < bits; j++) if (((a >> j) & 1) === 0) out.push(((a >> j) + 1) << j);
  return out;
}

/** The least union of pairwise disjoint candidates, by trying them all. */
function leastUnion(sets: number[], bits: number): number {
  let best = Infinity;
  const walk = (i: number, used: number) => {
    if (used >= best) return;
    if (i === sets.length) {
      best = used;
      return;
    }
    for (const b of candidates(sets[i]!, bits)) if ((b & used) === 0) walk(i + 1, used | b);
  };
  walk(0, 0);
  return best;
}

describe('ChildCombiner (the combining step of optimalTreeEdgeRanking)', () => {
  it('every number above a contains one of a\'s candidates, the fact the method rests on (all a < b < 2^10)', () => {
    const missing: [number, number][] = [];
    for (let a = 0; a < 1024; a++) {
      const mine = candidates(a, 11);
      for (let b = a + 1; b < 1024; b++) if (!mine.some((c) => (c & b) === c)) missing.push([a, b]);
    }
    expect(missing).toEqual([]);
  });

  it('finds the least union of disjoint candidates and gives each child one of its own (3000 runs, fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 200 }), { minLength: 2, maxLength: 5 }), (sets) => {
        const k = sets.length;
        const combiner = new ChildCombiner(k);
        const union = combiner.combine(Float64Array.from(sets), 0, k);
        expect(union).toBe(leastUnion(sets, 14));
        let seen = 0;
        for (let i = 0; i < k; i++) {
          const j = combiner.finish[i]!;
          expect((sets[i]! >> j) & 1).toBe(0); // the edge's label is one the child does not see
          const shown = ((sets[i]! >> j) + 1) << j;
          expect(shown & seen).toBe(0);
          seen |= shown;
        }
        expect(seen).toBe(union);
        const wide = new WideChildCombiner(k);
        expect(wide.combine(sets.map(BigInt), 0, k)).toBe(BigInt(union));
        expect([...wide.finish]).toEqual([...combiner.finish]);
      }),
      { numRuns: 3000 },
    );
  });

  it('reads the children from an offset into a shared array', () => {
    const combiner = new ChildCombiner(3);
    // {2, 2, 0}: 4 + 8 + 1 = 13, not the 15 of giving the children 3, 4 and 8 in turn.
    expect(combiner.combine(Float64Array.of(99, 2, 2, 0, 99), 1, 3)).toBe(13);
  });
});
