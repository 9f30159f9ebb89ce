import type { Graph } from '../../graph/graph';
import type { LowerBound } from '../lower-bound';
import { CITE } from './citations';
import { AdjacencyPool } from './adjacency-pool';
import { LazyMinHeap } from './min-heap';

export interface MinorMinWidthOptions {
  /**
   * Work allowed, counted as adjacency entries scanned by contractions; default 20,000,000 (ample for
   * graphs of ~10^5 vertices). Every prefix of the run gives a valid bound, so a capped run still
   * returns one and says it stopped.
   */
  budget?: number;
}

export const DEFAULT_MMW_BUDGET = 20_000_000;

/**
 * Minor-min-width (Gogate & Dechter, UAI 2004, with the min-d rule): repeatedly take a vertex v of least
 * degree in the current minor, record the largest such degree, and contract v into its neighbour of
 * least degree (an isolated v is deleted). Each minor H met has tw(G) >= tw(H) >= δ(H), so
 * tw(G) >= width (Bodlaender & Koster, Information and Computation 2011) and td >= tw + 1 >= width + 1;
 * directly, td is minor-monotone and a graph of minimum degree w has td >= w + 1 (Nešetřil & Ossona
 * de Mendez, Sparsity, 2012).
 *
 * An uncapped run is never below the degeneracy: each minor met contains G minus the vertices removed so
 * far as a subgraph (a contraction keeps u and hands it v's edges), so when the first vertex of the
 * d-core goes, every vertex left has degree >= d (the tests check this).
 *
 * The witness lists the contractions [v, u] (v merged into u) made before the step where the width was
 * reached: replaying them gives a minor of minimum degree `width` apart from vertices deleted when isolated.
 * Adjacency is an unordered list per vertex in one pool (adjacency-pool.ts); a contraction costs
 * deg(u) + the degrees of v's neighbours (v has least degree, so on sparse graphs this is small).
 */
export function minorMinWidthBound(g: Graph, options: MinorMinWidthOptions = {}): LowerBound {
  const n = g.vertexCount;
  if (n === 0) return { value: 0, witness: { kind: 'minor-min-width', width: 0, contractions: [] }, argument: 'the empty graph needs no labels' };
  const budget = options.budget ?? DEFAULT_MMW_BUDGET;
  const alive = new Uint8Array(n).fill(1);
  const adj = new AdjacencyPool(g);
  const degree = adj.length; // degree[v] = the length of v's list
  const stamp = new Int32Array(n).fill(-1); // stamp[w] === step: w is a neighbour of this step's u
  const heap = new LazyMinHeap(2 * n);
  for (let v = 0; v < n; v++) heap.push(degree[v]! * n + v, v);
  const contractions: [number, number][] = [];
  let width = 0;
  let witnessLength = 0;
  let remaining = n;
  let work = 0;
  let capped = false;

  // A minor with r vertices has minimum degree <= r - 1, so once r - 1 <= width nothing can raise it.
  while (remaining - 1 > width) {
    const key = heap.peekKey();
    const v = heap.pop();
    if (!alive[v] || key !== degree[v]! * n + v) continue; // stale entry
    const d = degree[v]!;
    if (d > width) {
      width = d;
      witnessLength = contractions.length;
    }
    alive[v] = 0;
    remaining--;
    if (d === 0) continue; // isolated: deleting it keeps a minor
    const from = adj.start[v]!;
    let u = -1;
    let cost = 0;
    for (let i = from; i < from + d; i++) {
      const w = adj.pool[i]!;
      cost += degree[w]!;
      if (u < 0 || degree[w]! < degree[u]! || (degree[w] === degree[u] && w < u)) u = w;
    }
    cost += degree[u]!;
    if (work + cost > budget) {
      capped = true;
      break;
    }
    work += cost;
    const step = contractions.length;
    for (let i = adj.start[u]!, end = i + degree[u]!; i < end; i++) stamp[adj.pool[i]!] = step;
    adj.remove(u, v);
    for (let i = from; i < from + d; i++) {
      const w = adj.pool[i]!; // v's list is not changed below: only u's and w's are
      if (w === u) continue;
      if (stamp[w] === step) {
        adj.remove(w, v); // w already touches u: the edge w—v merges into w—u
        heap.push(degree[w]! * n + w, w);
      } else {
        adj.replace(w, v, u); // w—v becomes w—u
        adj.add(u, w);
      }
    }
    heap.push(degree[u]! * n + u, u);
    contractions.push([v, u]);
  }
  const value = width + 1;
  const status = capped ? `stopped at its work cap of ${budget} after ${contractions.length} contractions, so a full run might reach more` : 'ran to the end';
  return {
    value,
    witness: { kind: 'minor-min-width', width, contractions: contractions.slice(0, witnessLength) },
    argument:
      `after ${witnessLength} edge contractions the minor has minimum degree ${width} (minor-min-width, ${CITE.gogateDechter}); ` +
      `so tw >= ${width} (${CITE.bodlaenderKoster}) and td >= tw + 1 = ${value}; the heuristic ${status}`,
  };
}

