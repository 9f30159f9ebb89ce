import { describe, expect, it } from 'vitest';
import { graphFromEdges, pathGraph, verifyRanking } from '../src/index';

/** The ruler labelling of P_n: vertex i gets 1 + the number of trailing zero bits of i + 1. */
function rulerLabels(n: number): number[] {
  return Array.from({ length: n }, (_, i) => 1 + Math.log2((i + 1) & -(i + 1)));
}

/** Brute force straight from the definition: search every simple path that starts at a vertex. */
function isRankingByDefinition(n: number, pairs: number[], labels: number[]): boolean {
  const adj: number[][] = Array.from({ length: n }, () => []);
  for (let i = 0; i < pairs.length; i += 2) {
    const [u, v] = [pairs[i]!, pairs[i + 1]!];
    if (u !== v && !adj[u]!.includes(v)) {
      adj[u]!.push(v);
      adj[v]!.push(u);
    }
  }
  const onPath = new Array<boolean>(n).fill(false);
  const walk = (start: number, x: number, maxInside: number): boolean => {
    onPath[x] = true;
    for (const w of adj[x]!) {
      if (onPath[w]) continue;
      if (labels[w] === labels[start] && maxInside <= labels[start]!) return false;
      if (!walk(start, w, Math.max(maxInside, labels[w]!))) return false;
    }
    onPath[x] = false;
    return true;
  };
  for (let s = 0; s < n; s++) {
    onPath.fill(false);
    if (!walk(s, s, 0)) return false;
  }
  return true;
}

describe('verifyRanking', () => {
  it('accepts the ruler labelling of P_n with floor(log2 n) + 1 labels (Bodlaender et al., SIAM J. Discrete Math. 1998)', () => {
    for (let n = 1; n <= 200; n++) {
      const verdict = verifyRanking(pathGraph(n), rulerLabels(n));
      expect(verdict).toMatchObject({ valid: true, labelsUsed: Math.floor(Math.log2(n)) + 1 });
    }
  });

  it('names two equal labels and the path of smaller labels between them', () => {
    const g = pathGraph(5);
    const verdict = verifyRanking(g, [2, 1, 3, 1, 2]);
    expect(verdict.valid).toBe(true);
    const bad = verifyRanking(g, [3, 1, 2, 1, 3]);
    expect(bad.valid).toBe(false);
    if (bad.valid) return;
    expect(bad.violation.label).toBe(3);
    const { u, v, path } = bad.violation;
    expect([u, v].sort()).toEqual([0, 4]);
    expect(path).toEqual(u === 0 ? [0, 1, 2, 3, 4] : [4, 3, 2, 1, 0]);
    const adjacent = verifyRanking(g, [2, 1, 1, 3, 1]);
    expect(adjacent).toMatchObject({ valid: false, violation: { label: 1 } });
  });

  it('agrees with a search over every simple path on small random graphs', () => {
    let seed = 12345;
    const rand = (k: number) => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return seed % k;
    };
    for (let trial = 0; trial < 400; trial++) {
      const n = 1 + rand(7);
      const pairs: number[] = [];
      for (let u = 0; u < n; u++) for (let v = u + 1; v < n; v++) if (rand(2)) pairs.push(u, v);
      const labels = Array.from({ length: n }, () => 1 + rand(4));
      const verdict = verifyRanking(graphFromEdges(n, pairs), labels);
      expect(verdict.valid, `n=${n} edges=${pairs} labels=${labels}`).toBe(isRankingByDefinition(n, pairs, labels));
    }
  });

  it('reads labels far larger than the vertex count the same way', () => {
    const labels = rulerLabels(100);
    expect(verifyRanking(pathGraph(100), labels.map((l) => l * 10_000_000))).toMatchObject({ valid: true, labelsUsed: 7 });
    expect(verifyRanking(pathGraph(3), [2e9, 1e9, 2e9]).valid).toBe(false);
  });

  it('rejects labels that are not whole numbers >= 1', () => {
    expect(() => verifyRanking(pathGraph(3), [1, 0, 1])).toThrow(/vertex 1/);
    expect(() => verifyRanking(pathGraph(3), [1, 2])).toThrow(/expected 3 labels/);
  });
});
