import { popcount32 } from '../../graph/bitset';
import type { Graph } from '../../graph/graph';
import type { LowerBound } from '../lower-bound';
import { CITE } from './citations';
import { coreDecomposition } from './core-decomposition';

export interface CliqueOptions {
  /** Work allowed: search nodes plus adjacency tests while building each neighbourhood; default 2,000,000. */
  budget?: number;
}

export const DEFAULT_CLIQUE_BUDGET = 2_000_000;

/**
 * A clique K_k in g gives χr(G) >= k: its vertices are pairwise adjacent, so all their labels differ
 * (common practice; χr monotone under subgraphs, Nešetřil & Ossona de Mendez, Sparsity, 2012).
 *
 * Search: Bron–Kerbosch (Comm. ACM 1973) with the pivot of Tomita et al. (Theor. Comput. Sci. 2006), run
 * for each vertex v over its later neighbours in a degeneracy order (Eppstein, Löffler & Strash,
 * ISAAC 2010), so each run works on at most `degeneracy` vertices, as bitsets in one scratch arena.
 * Branches that cannot beat the best clique so far (|R| + |P| <= best) are cut, and vertices whose core
 * number + 1 cannot beat it are skipped. Exact when it finishes within the budget; the argument says
 * which. Every clique is found from its earliest vertex in the order, so the runs miss none.
 */
export function cliqueBound(g: Graph, options: CliqueOptions = {}): LowerBound {
  const n = g.vertexCount;
  if (n === 0) return { value: 0, witness: { kind: 'clique', vertices: [] }, argument: 'the empty graph needs no labels' };
  const budget = options.budget ?? DEFAULT_CLIQUE_BUDGET;
  const { order, position, core, degeneracy } = coreDecomposition(g);
  const search = new LocalCliqueSearch(degeneracy);
  let best: number[] = [order[n - 1]!];
  let work = 0;
  let finished = true;
  const later: number[] = [];

  // Latest-removed vertices first: they sit in the densest cores, so good cliques come early.
  for (let i = n - 1; i >= 0 && best.length < degeneracy + 1; i--) {
    const v = order[i]!;
    if (core[v]! + 1 <= best.length) continue;
    later.length = 0;
    for (let e = g.offsets[v]!, end = g.offsets[v + 1]!; e < end; e++) if (position[g.targets[e]!]! > i) later.push(g.targets[e]!);
    if (later.length + 1 <= best.length) continue;
    work += (later.length * (later.length - 1)) / 2;
    if (work > budget) {
      finished = false;
      break;
    }
    const found = search.run(g, later, best.length - 1, budget - work);
    work += found.nodes;
    if (found.clique) best = [v, ...found.clique];
    if (!found.finished) {
      finished = false;
      break;
    }
  }
  const vertices = best.sort((a, b) => a - b);
  const status = finished
    ? vertices.length === degeneracy + 1
      ? `maximum: no clique exceeds degeneracy + 1 = ${degeneracy + 1}`
      : 'maximum: the search finished'
    : `the search stopped at its budget of ${budget}, so a larger clique may exist`;
  return {
    value: vertices.length,
    witness: { kind: 'clique', vertices },
    argument: `a clique on ${vertices.length} vertices needs ${vertices.length} distinct labels (${CITE.common}); found by Bron–Kerbosch with pivoting (${CITE.bronKerbosch}; ${CITE.tomita}; ${CITE.eppstein}); ${status}`,
  };
}

/**
 * Bron–Kerbosch with Tomita's pivot for a maximum clique among a few vertices, on word bitsets: row a of
 * `adj` is the local neighbourhood of vertex a, and the candidate set of each depth lives in its own row
 * of `arena`, so the search allocates nothing per node. No excluded set X is kept: for a maximum clique it
 * only prunes non-maximal cliques, which the size bound cuts anyway.
 */
class LocalCliqueSearch {
  private adj = new Uint32Array(0);
  private arena = new Uint32Array(0);
  private words = 0;
  private vertices: readonly number[] = [];
  private chosen: number[] = [];
  private best: number[] | undefined;
  private bestSize = 0;
  private nodes = 0;
  private budget = 0;

  constructor(private readonly maxSize: number) {}

  /** A clique among `vertices` larger than `beat`, the largest such, or none; `nodes` spent of `budget`. */
  run(g: Graph, vertices: readonly number[], beat: number, budget: number): { clique: number[] | undefined; nodes: number; finished: boolean } {
    const k = vertices.length;
    const words = (this.words = (k + 31) >>> 5);
    const rows = Math.max(k, this.maxSize) + 2;
    if (this.adj.length < k * words) this.adj = new Uint32Array(rows * words);
    if (this.arena.length < (k + 2) * words) this.arena = new Uint32Array(rows * words);
    const adj = this.adj.fill(0, 0, k * words);
    for (let a = 0; a < k; a++) {
      for (let b = a + 1; b < k; b++) {
        if (g.hasEdge(vertices[a]!, vertices[b]!)) {
          adj[a * words + (b >>> 5)]! |= 1 << (b & 31);
          adj[b * words + (a >>> 5)]! |= 1 << (a & 31);
        }
      }
    }
    this.arena.fill(0, 0, words);
    for (let a = 0; a < k; a++) this.arena[a >>> 5]! |= 1 << (a & 31);
    this.vertices = vertices;
    this.chosen.length = 0;
    this.best = undefined;
    this.bestSize = beat;
    this.nodes = 0;
    this.budget = budget;
    const finished = this.expand(0);
    return { clique: this.best, nodes: this.nodes, finished };
  }

  private size(depth: number): number {
    let c = 0;
    for (let i = depth * this.words, end = i + this.words; i < end; i++) c += popcount32(this.arena[i]!);
    return c;
  }

  /** Searches the candidates in arena row `depth`; false when the budget ran out. */
  private expand(depth: number): boolean {
    if (++this.nodes > this.budget) return false;
    const { words, arena, adj, chosen } = this;
    const p = depth * words;
    let count = this.size(depth);
    if (count === 0) {
      if (chosen.length > this.bestSize) {
        this.bestSize = chosen.length;
        this.best = chosen.map((a) => this.vertices[a]!);
      }
      return true;
    }
    if (chosen.length + count <= this.bestSize) return true;
    // Tomita's pivot: the candidate with the most candidates among its neighbours.
    let pivot = -1;
    let pivotScore = -1;
    for (let i = 0; i < words; i++) {
      for (let w = arena[p + i]!; w !== 0; w &= w - 1) {
        const u = (i << 5) + 31 - Math.clz32(w & -w);
        let score = 0;
        for (let j = 0; j < words; j++) score += popcount32(arena[p + j]! & adj[u * words + j]!);
        if (score > pivotScore) {
          pivotScore = score;
          pivot = u;
        }
      }
    }
    const q = p + words;
    for (let i = 0; i < words; i++) {
      // Branch on the candidates outside the pivot's neighbourhood (the pivot itself among them).
      let branch = arena[p + i]! & ~adj[pivot * words + i]!;
      while (branch !== 0) {
        const bit = branch & -branch;
        branch ^= bit;
        const u = (i << 5) + 31 - Math.clz32(bit);
        for (let j = 0; j < words; j++) arena[q + j] = arena[p + j]! & adj[u * words + j]!;
        chosen.push(u);
        const ok = this.expand(depth + 1);
        chosen.pop();
        if (!ok) return false;
        arena[p + i]! &= ~bit;
        count--;
        if (chosen.length + count <= this.bestSize) return true;
      }
    }
    return true;
  }
}
