import { SizeError } from '../errors';
import { ALPERT_2010, BODLAENDER_1998, COMMON_PRACTICE, type FormulaSource } from './sources';

/** ⌊log2 x⌋ for x >= 1, exact for every safe integer (no floating-point logarithm). */
export function floorLog2(x: number): number {
  if (!(x >= 1)) throw new SizeError(`floorLog2 needs x >= 1, got ${x}`);
  let k = 0;
  let v = Math.floor(x);
  while (v >= 2 ** 30) {
    v = Math.floor(v / 2 ** 30);
    k += 30;
  }
  return k + 31 - Math.clz32(v);
}

/** One closed form: an id for provenance (`formula:<id>`), its statement in words, and its source. */
export interface ClosedForm {
  id: string;
  statement: string;
  source: FormulaSource;
}

export const CLOSED_FORMS = {
  path: { id: 'path', statement: 'χr(P_n) = ⌊log2 n⌋ + 1', source: BODLAENDER_1998 },
  cycle: { id: 'cycle', statement: 'χr(C_n) = 2 + ⌊log2(n − 1)⌋ for n >= 3', source: BODLAENDER_1998 },
  complete: { id: 'complete', statement: 'χr(K_n) = n (every pair is adjacent)', source: COMMON_PRACTICE },
  completeBipartite: { id: 'complete-bipartite', statement: 'χr(K_{a,b}) = min(a, b) + 1', source: COMMON_PRACTICE },
  completeMultipartite: {
    id: 'complete-multipartite',
    statement: 'χr(K_{n1,...,nk}) = (n1 + ... + nk) − max ni + 1',
    source: COMMON_PRACTICE,
  },
  star: { id: 'star', statement: 'χr(K_{1,n}) = 2 for n >= 1', source: COMMON_PRACTICE },
  grid2: {
    id: 'grid-2xn',
    statement: 'χr(P_2 × P_n) = ⌊log2(n + 1)⌋ + ⌊log2((n + 1)/3)⌋ + 2, with ⌊log2 x⌋ = −1 for x < 1',
    source: ALPERT_2010,
  },
} as const satisfies Record<string, ClosedForm>;

const whole = (what: string, n: number, min: number) => {
  if (!Number.isSafeInteger(n) || n < min) throw new SizeError(`${what} needs a whole number >= ${min}, got ${n}`);
};

/** χr(P_n) = ⌊log2 n⌋ + 1 (Bodlaender et al., "Rankings of graphs", SIAM J. Discrete Math. 1998). */
export function pathRankNumber(n: number): number {
  whole('pathRankNumber', n, 1);
  return floorLog2(n) + 1;
}

/** χr(C_n) = 2 + ⌊log2(n − 1)⌋, n >= 3 (Bodlaender et al. 1998): one vertex, then the path P_{n−1}. */
export function cycleRankNumber(n: number): number {
  whole('cycleRankNumber', n, 3);
  return 2 + floorLog2(n - 1);
}

/** χr(K_n) = n: every two vertices are adjacent, so all labels differ (common practice). */
export function completeRankNumber(n: number): number {
  whole('completeRankNumber', n, 1);
  return n;
}

/**
 * χr of the complete multipartite graph with the given part sizes: all but the largest part must get
 * distinct labels, and the largest part can then share one (common practice).
 */
export function completeMultipartiteRankNumber(parts: readonly number[]): number {
  if (parts.length === 0) throw new SizeError('completeMultipartiteRankNumber needs at least one part');
  for (const p of parts) whole('a part size', p, 1);
  const total = parts.reduce((a, b) => a + b, 0);
  return total - Math.max(...parts) + 1;
}

/** χr(K_{a,b}) = min(a, b) + 1, the two-part case of the multipartite form (common practice). */
export function completeBipartiteRankNumber(a: number, b: number): number {
  return completeMultipartiteRankNumber([a, b]);
}

/** χr(K_{1,n}) = 2 for n >= 1: the centre above, all leaves share the smallest label (common practice). */
export function starRankNumber(leaves: number): number {
  whole('starRankNumber', leaves, 1);
  return 2;
}

/**
 * χr(P_2 × P_n) = ⌊log2(n + 1)⌋ + ⌊log2((n + 1)/3)⌋ + 2 with ⌊log2 x⌋ = −1 for x < 1
 * (Alpert, "Rank numbers of grid graphs", Discrete Math. 2010; stated from memory and checked by
 * exhaustive search, see the tests).
 */
export function grid2RankNumber(n: number): number {
  whole('grid2RankNumber', n, 1);
  const third = Math.floor((n + 1) / 3); // ⌊log2((n+1)/3)⌋ = ⌊log2 ⌊(n+1)/3⌋⌋ for (n+1)/3 >= 1
  return floorLog2(n + 1) + (third >= 1 ? floorLog2(third) : -1) + 2;
}
