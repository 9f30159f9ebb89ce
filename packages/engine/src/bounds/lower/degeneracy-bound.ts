import type { Graph } from '../../graph/graph';
import type { LowerBound } from '../lower-bound';
import { CITE } from './citations';
import { coreDecomposition } from './core-decomposition';

/**
 * Degeneracy + 1. The d-core H (the vertices of core number d, d the largest) has minimum degree >= d, so td(G) >= td(H) >= d + 1: in any elimination forest a deepest vertex of H has all
 * its H-neighbours as ancestors (Nešetřil & Ossona de Mendez, Sparsity, 2012). Equivalently
 * td >= tw + 1 >= degeneracy + 1 (Bodlaender & Koster 2011). Degeneracy by the bucket algorithm of
 * Matula & Beck, J. ACM 1983, O(n + m).
 */
export function degeneracyBound(g: Graph): LowerBound {
  const n = g.vertexCount;
  if (n === 0) {
    return { value: 0, witness: { kind: 'degeneracy', degeneracy: 0, core: [] }, argument: 'the empty graph needs no labels' };
  }
  const { order, core: coreNumber, degeneracy } = coreDecomposition(g);
  // Core numbers are non-decreasing along the order, so the d-core is a suffix of it.
  let first = n - 1;
  while (first > 0 && coreNumber[order[first - 1]!]! === degeneracy) first--;
  const inCore = new Uint8Array(n);
  for (let i = first; i < n; i++) inCore[order[i]!] = 1;
  const core: number[] = [];
  for (let v = 0; v < n; v++) if (inCore[v]) core.push(v);
  return {
    value: degeneracy + 1,
    witness: { kind: 'degeneracy', degeneracy, core },
    argument:
      `the ${core.length} vertices of the ${degeneracy}-core each have >= ${degeneracy} neighbours among themselves, ` +
      `so td >= tw + 1 >= degeneracy + 1 = ${degeneracy + 1} (${CITE.bodlaenderKoster}; degeneracy by ${CITE.matulaBeck}; ` +
      `td monotone under subgraphs, ${CITE.sparsity})`,
  };
}
