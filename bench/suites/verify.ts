import { pathGraph, verifyRanking } from '@cairn/engine';
import { runCases } from '../harness';

/** Verifying the ruler ranking of long paths: the verifier's cost is near-linear in V + E. */
export function verifySuite(maxTime: number) {
  const cases: Record<string, () => void> = {};
  for (const n of [1_000, 100_000, 1_000_000]) {
    const g = pathGraph(n);
    const labels = Int32Array.from({ length: n }, (_, i) => 1 + Math.log2((i + 1) & -(i + 1)));
    cases[`verifyRanking path:${n}`] = () => {
      if (!verifyRanking(g, labels).valid) throw new Error('ruler labelling must verify');
    };
  }
  return runCases(cases, maxTime);
}
