import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  eliminationForest,
  eliminationOrder,
  isMinimalRanking,
  LabelError,
  normalizeLabels,
  pathGraph,
  stepPlan,
  verifyRanking,
  type Graph,
} from '../src/index';
import { arbitraryGraph, rulerLabels, toGraph } from './support';

/** A random ranking of g: distinct labels on a random permutation (all labels differ, so it is one). */
function randomRanking(g: Graph, choices: number[]): number[] {
  const n = g.vertexCount;
  const perm = Array.from({ length: n }, (_, i) => i);
  for (let i = n - 1; i > 0; i--) {
    const j = (choices[i] ?? 0) % (i + 1);
    [perm[i], perm[j]] = [perm[j]!, perm[i]!];
  }
  const labels = new Array<number>(n);
  perm.forEach((v, i) => (labels[v] = i + 1));
  return labels;
}

/** Every ranking that lowers one label of `labels` by any amount, searched literally with the verifier. */
function lowerableByBruteForce(g: Graph, labels: number[]): boolean {
  for (let v = 0; v < labels.length; v++) {
    for (let to = 1; to < labels[v]!; to++) {
      const next = labels.slice();
      next[v] = to;
      if (verifyRanking(g, next).valid) return true;
    }
  }
  return false;
}

/** Lowers labels one at a time while the result stays a ranking, giving a minimal ranking to test against. */
function makeMinimal(g: Graph, labels: number[]): number[] {
  const out = labels.slice();
  let changed = true;
  while (changed) {
    changed = false;
    for (let v = 0; v < out.length; v++) {
      for (let to = 1; to < out[v]!; to++) {
        const next = out.slice();
        next[v] = to;
        if (verifyRanking(g, next).valid) {
          out[v] = to;
          changed = true;
          break;
        }
      }
    }
  }
  return out;
}

const rankedGraph = arbitraryGraph(8).chain(([n, pairs]) =>
  fc.tuple(fc.constant(n), fc.constant(pairs), fc.array(fc.nat(1000), { minLength: n, maxLength: n }), fc.boolean()),
);

describe('isMinimalRanking', () => {
  it('agrees with trying every single lowering on 1500 random rankings (fast-check)', () => {
    fc.assert(
      fc.property(rankedGraph, ([n, pairs, choices, squeeze]) => {
        const g = toGraph([n, pairs]);
        let labels = randomRanking(g, choices);
        if (squeeze) labels = makeMinimal(g, labels);
        const verdict = isMinimalRanking(g, labels);
        expect(verdict.minimal).toBe(!lowerableByBruteForce(g, labels));
        if (!verdict.minimal) {
          const { vertex, from, to } = verdict.lowerable;
          expect(labels[vertex]).toBe(from);
          const next = labels.slice();
          next[vertex] = to;
          expect(verifyRanking(g, next).valid).toBe(true);
        }
      }),
      { numRuns: 1500 },
    );
  });

  it('finds the ruler ranking of a path minimal, and a ranking with a gap not', () => {
    expect(isMinimalRanking(pathGraph(15), rulerLabels(15))).toEqual({ minimal: true });
    expect(isMinimalRanking(pathGraph(3), [1, 3, 1])).toEqual({ minimal: false, lowerable: { vertex: 1, from: 3, to: 2 } });
  });

  it('refuses a labelling that is not a ranking', () => {
    expect(() => isMinimalRanking(pathGraph(2), [1, 1])).toThrow(LabelError);
  });
});

describe('normalizeLabels, eliminationForest, stepPlan, eliminationOrder', () => {
  it('keep a ranking a ranking and read the right structure from it (1000 cases, fast-check)', () => {
    fc.assert(
      fc.property(rankedGraph, ([n, pairs, choices, squeeze]) => {
        const g = toGraph([n, pairs]);
        const base = randomRanking(g, choices);
        const raw = (squeeze ? makeMinimal(g, base) : base).map((l) => l * 3 + 7);
        const labels = Array.from(normalizeLabels(g, raw));
        const used = new Set(raw).size;
        expect(new Set(labels)).toEqual(new Set(Array.from({ length: used }, (_, i) => i + 1)));
        for (let u = 0; u < n; u++) for (let v = 0; v < n; v++) expect(Math.sign(labels[u]! - labels[v]!)).toBe(Math.sign(raw[u]! - raw[v]!));
        expect(verifyRanking(g, labels).valid).toBe(true);

        const parent = eliminationForest(g, raw);
        const ancestors = (v: number) => {
          const out = new Set<number>();
          for (let x = parent[v]!; x !== -1; x = parent[x]!) out.add(x);
          return out;
        };
        for (let v = 0; v < n; v++) {
          if (parent[v] !== -1) expect(raw[parent[v]!]!).toBeGreaterThan(raw[v]!);
          expect(ancestors(v).size).toBeLessThan(used); // depth <= labels used
        }
        // Every edge joins a vertex to one of its ancestors (the defining property of an elimination forest).
        for (const [u, v] of g.edges()) expect(ancestors(u).has(v) || ancestors(v).has(u)).toBe(true);

        const plan = stepPlan(g, raw);
        expect(plan.map((s) => s.step)).toEqual(plan.map((_, i) => i + 1));
        expect(plan.flatMap((s) => s.vertices).sort((a, b) => a - b)).toEqual(Array.from({ length: n }, (_, i) => i));
        for (const s of plan) for (const v of s.vertices) expect(raw[v]).toBe(s.label);

        const order = Array.from(eliminationOrder(g, raw));
        expect([...order].sort((a, b) => a - b)).toEqual(Array.from({ length: n }, (_, i) => i));
        for (let i = 1; i < n; i++) expect(raw[order[i - 1]!]!).toBeLessThanOrEqual(raw[order[i]!]!);
      }),
      { numRuns: 1000 },
    );
  });

  it('reads the step plan of the ruler ranking of P_7 bottom up', () => {
    expect(stepPlan(pathGraph(7), rulerLabels(7))).toEqual([
      { step: 1, label: 1, vertices: [0, 2, 4, 6] },
      { step: 2, label: 2, vertices: [1, 5] },
      { step: 3, label: 3, vertices: [3] },
    ]);
    expect(Array.from(eliminationForest(pathGraph(7), rulerLabels(7)))).toEqual([1, 3, 1, -1, 5, 3, 5]);
  });
});
