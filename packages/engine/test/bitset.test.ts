import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Bitset } from '../src/index';

const members = (size: number) => fc.uniqueArray(fc.nat(size - 1), { maxLength: size });
const sized = fc.integer({ min: 1, max: 200 }).chain((size) => fc.tuple(fc.constant(size), members(size), members(size)));

describe('Bitset', () => {
  it('agrees with Set for and, or, andNot, popcount, iteration, first and equality (1000 cases, fast-check)', () => {
    fc.assert(
      fc.property(sized, ([size, xs, ys]) => {
        const a = Bitset.of(size, xs);
        const b = Bitset.of(size, ys);
        const A = new Set(xs);
        const B = new Set(ys);
        const sorted = (s: Iterable<number>) => [...s].sort((p, q) => p - q);
        expect(a.toArray()).toEqual(sorted(A));
        expect([...a]).toEqual(sorted(A));
        expect(a.and(b).toArray()).toEqual(sorted(xs.filter((x) => B.has(x))));
        expect(a.or(b).toArray()).toEqual(sorted(new Set([...xs, ...ys])));
        expect(a.andNot(b).toArray()).toEqual(sorted(xs.filter((x) => !B.has(x))));
        expect(a.popcount()).toBe(A.size);
        expect(a.first()).toBe(A.size ? Math.min(...A) : -1);
        expect(a.isEmpty()).toBe(A.size === 0);
        expect(a.intersects(b)).toBe(xs.some((x) => B.has(x)));
        expect(a.isSubsetOf(b)).toBe(xs.every((x) => B.has(x)));
        expect(a.equals(Bitset.of(size, [...xs].reverse()))).toBe(true);
        expect(a.hash()).toBe(Bitset.of(size, xs).hash());
        expect(a.equals(b)).toBe(sorted(A).join() === sorted(B).join());
      }),
      { numRuns: 1000 },
    );
  });

  it('changes in place with the *With methods and leaves the others alone', () => {
    const a = Bitset.of(70, [1, 33, 69]);
    const b = Bitset.of(70, [33]);
    const c = a.andNot(b);
    expect(a.toArray()).toEqual([1, 33, 69]);
    a.andNotWith(b);
    expect(a.toArray()).toEqual(c.toArray());
    expect(Bitset.full(70).popcount()).toBe(70);
    expect(Bitset.full(64).popcount()).toBe(64);
    expect(a.clone().add(5).delete(1).toArray()).toEqual([5, 69]);
  });
});
