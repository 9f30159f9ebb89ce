import { SizeError } from '../errors';
import { checkVertexCount, graphFromEdges } from '../graph/from-edges';
import type { Graph } from '../graph/graph';
import { MAX_EDGES } from '../graph/limits';
import { seededRandom } from './seeded-random';
import { checkWhole } from './sizes';

/**
 * The Erdős–Rényi random graph G(n, p), reproducible from its seed: each of the n(n - 1) / 2 pairs is an
 * edge with probability p. Skips geometrically between edges, so the cost follows the edges, not the pairs
 * (Batagelj & Brandes, "Efficient generation of large random networks", Phys. Rev. E 71, 2005).
 */
export function randomGraph(n: number, p: number, seed: number): Graph {
  checkWhole('random graph', 'n', n, 1);
  // Before any loop: the walk below visits every vertex, so an absurd n must be refused up front.
  checkVertexCount(n, 'random graph: n');
  if (!(p >= 0 && p <= 1)) throw new SizeError(`random graph: p must be a probability in [0, 1], got ${p}`);
  const expected = (p * n * (n - 1)) / 2;
  if (expected > MAX_EDGES / 2) throw new SizeError(`random graph: about ${Math.round(expected)} edges expected; at most ${MAX_EDGES / 2} may be asked for`);
  const rand = seededRandom(seed);
  const pairs: number[] = [];
  if (p === 1) {
    for (let v = 1; v < n; v++) for (let w = 0; w < v; w++) pairs.push(v, w);
  } else if (p > 0) {
    const logq = Math.log1p(-p); // exact for tiny p, where log(1 - p) would round to 0
    let v = 1;
    let w = -1;
    while (v < n) {
      w += 1 + Math.floor(Math.log(1 - rand()) / logq);
      while (w >= v && v < n) {
        w -= v;
        v++;
      }
      if (v < n) pairs.push(v, w);
    }
  }
  return graphFromEdges(n, pairs, { kind: 'randomGraph', n, p, seed });
}
