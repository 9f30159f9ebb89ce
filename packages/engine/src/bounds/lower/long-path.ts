import { componentIds } from '../../graph/components';
import type { Graph } from '../../graph/graph';
import { floorLog2, pathRankNumber } from '../../formulas/closed-forms';
import type { LowerBound } from '../lower-bound';
import { CITE } from './citations';
import { warnsdorffSearch } from './path-dfs';
import { deepestDfsPath } from './path-dfs-tree';
import { rotationSearch } from './path-rotation';

export interface LongPathOptions {
  /** Search steps (each vertex added, retreat or reversed position counts one); default 1,000,000 + 10 n. */
  budget?: number;
  /** How many start vertices to try (peripheral ones first); default 3. */
  starts?: number;
}

/** The fixed part of the default path budget; 10 steps per vertex are added. */
export const DEFAULT_PATH_BUDGET = 1_000_000;

/**
 * A long simple path P_k in g gives χr(G) >= χr(P_k) = ⌊log2 k⌋ + 1 (Bodlaender et al., SIAM J. Discrete
 * Math. 1998), since χr = td is monotone under subgraphs (Nešetřil & Ossona de Mendez, Sparsity, 2012).
 *
 * Search, in each of the few largest components that could still raise the bound: the diameter path of
 * a double BFS (a shortest path between two far vertices; a longest path when the component is a tree,
 * common practice); the deepest path of a DFS tree from each of a few start vertices (the two peripheral
 * ends, then a vertex of least degree; path-dfs-tree.ts, linear time); greedy growth of the best path
 * with Pósa rotations (path-rotation.ts); then, with the budget left, backtracking DFS (path-dfs.ts) from
 * the same starts, or from every vertex of a component of at most 32 vertices (in a graph of at most
 * 4096), so that on small graphs the search is exhaustive. All of them step first to the neighbour with the fewest unvisited neighbours
 * (Warnsdorff's rule, common practice). Only ⌊log2 k⌋ matters, so the search of a component stops once
 * k reaches the largest power of two in it. Deterministic: ties go to the smaller vertex.
 */
export function longPathBound(g: Graph, options: LongPathOptions = {}): LowerBound {
  const n = g.vertexCount;
  if (n === 0) return { value: 0, witness: { kind: 'path', vertices: [] }, argument: 'the empty graph needs no labels' };
  const budget = options.budget ?? DEFAULT_PATH_BUDGET + 10 * n;
  const startCount = Math.max(1, options.starts ?? 3);
  const components = largestComponents(g, MAX_COMPONENTS);
  const search: SearchState = {
    remaining: budget,
    // Backtracking rarely helps on large graphs, so by default it gets at most DEFAULT_PATH_BUDGET steps.
    backtrackLeft: options.budget === undefined ? DEFAULT_PATH_BUDGET : Infinity,
    exhausted: false,
  };
  let best: number[] = [];
  let searched = 0;
  // Largest first; a component of size s can give at most ⌊log2 s⌋, so stop when that cannot beat the best.
  for (let i = 0; i < components.length; i++) {
    const { marks, size } = components[i]!;
    if (best.length > 0 && floorLog2(size) <= floorLog2(best.length)) break;
    const path = searchComponent(g, marks, size, startCount, Math.floor(search.remaining / (components.length - i)), search);
    searched++;
    if (path.length > best.length) best = path;
  }
  const k = best.length;
  const value = pathRankNumber(k);
  const note =
    floorLog2(k) >= floorLog2(components[0]!.size)
      ? 'no longer path can raise the bound'
      : search.exhausted
        ? `search stopped at its budget of ${budget} steps`
        : `the search finished in the ${searched} largest components (exhaustive for trees, and for components of <= ${EXHAUSTIVE_SIZE} vertices in graphs of <= ${EXHAUSTIVE_GRAPH})`;
  return {
    value,
    witness: { kind: 'path', vertices: best },
    argument: `a path on ${k} vertices; χr(P_${k}) = ⌊log2 ${k}⌋ + 1 = ${value} (${CITE.rankings}), and χr is monotone under subgraphs (${CITE.sparsity}); ${note}`,
  };
}

/** How many of the largest components are searched at most. */
const MAX_COMPONENTS = 8;
/** Components up to this size, in graphs up to EXHAUSTIVE_GRAPH vertices, are backtracked from every vertex. */
const EXHAUSTIVE_SIZE = 32;
const EXHAUSTIVE_GRAPH = 4096;

interface SearchState {
  remaining: number;
  backtrackLeft: number;
  exhausted: boolean;
}

/**
 * A long path in one component, within `share` steps of the shared budget: the double-BFS path (a
 * longest path when the component is a tree, common practice), then DFS trees, rotations and
 * backtracking as described at longPathBound.
 */
function searchComponent(g: Graph, marks: Uint8Array, size: number, startCount: number, share: number, state: SearchState): number[] {
  const cap = floorLog2(size); // ⌊log2 k⌋ can be no more than this
  const stopAt = 2 ** cap; // a path this long already reaches it
  let best = diameterPath(g, marks);
  if (componentEdges(g, marks) === size - 1) return best;
  const starts = startVertices(g, marks, best, startCount);
  let left = share;
  const spend = (steps: number, stoppedByBudget: boolean) => {
    left -= steps;
    state.remaining -= steps;
    state.exhausted ||= stoppedByBudget;
  };
  const done = () => floorLog2(best.length) >= cap || left <= 0;
  for (let i = 0; i < starts.length && !done(); i++) {
    const run = deepestDfsPath(g, starts[i]!, Math.floor(left / (starts.length - i)), stopAt);
    spend(run.steps, run.stoppedByBudget);
    if (run.path.length > best.length) best = Array.from(run.path);
  }
  if (!done()) {
    const run = rotationSearch(g, best, left, stopAt);
    spend(run.steps, run.stoppedByBudget);
    if (run.path.length > best.length) best = Array.from(run.path);
  }
  left = Math.min(left, state.backtrackLeft);
  // Each root costs O(n) set-up, so every vertex is a root only in small graphs.
  const everyRoot = size <= EXHAUSTIVE_SIZE && g.vertexCount <= EXHAUSTIVE_GRAPH;
  const roots = everyRoot ? Array.from(marks.keys()).filter((v) => marks[v]) : starts;
  for (let i = 0; i < roots.length && !done(); i++) {
    const run = warnsdorffSearch(g, roots[i]!, Math.floor(left / (roots.length - i)), floorLog2(best.length), cap);
    spend(run.steps, run.stoppedByBudget);
    state.backtrackLeft -= run.steps;
    if (run.path && floorLog2(run.path.length) > floorLog2(best.length)) best = run.path;
  }
  return best;
}

/** The `limit` largest components as vertex marks, largest first (smallest first vertex on ties). */
function largestComponents(g: Graph, limit: number): { marks: Uint8Array; size: number }[] {
  const { ids, count } = componentIds(g);
  const sizes = new Int32Array(count);
  for (let v = 0; v < ids.length; v++) sizes[ids[v]!]!++;
  // Keep the top `limit` by insertion (a graph may have millions of components); ids follow their
  // smallest vertex, so inserting only past strictly smaller sizes keeps ties in vertex order.
  const chosen: number[] = [];
  for (let c = 0; c < count; c++) {
    if (chosen.length === limit && sizes[c]! <= sizes[chosen[limit - 1]!]!) continue;
    let j = chosen.length < limit ? chosen.length : limit - 1;
    while (j > 0 && sizes[chosen[j - 1]!]! < sizes[c]!) {
      if (j < limit) chosen[j] = chosen[j - 1]!;
      j--;
    }
    chosen[j] = c;
  }
  return chosen.map((c) => {
    const marks = new Uint8Array(ids.length);
    for (let v = 0; v < ids.length; v++) if (ids[v] === c) marks[v] = 1;
    return { marks, size: sizes[c]! };
  });
}

/** The number of edges inside the marked component. */
function componentEdges(g: Graph, component: Uint8Array): number {
  let twice = 0;
  for (let v = 0; v < component.length; v++) if (component[v]) twice += g.degree(v);
  return twice / 2;
}

/** BFS from `source`; returns the parents and the last vertex reached (a farthest one). */
function bfs(g: Graph, source: number): { parent: Int32Array; last: number } {
  const n = g.vertexCount;
  const { offsets, targets } = g;
  const parent = new Int32Array(n).fill(-2);
  const queue = new Int32Array(n);
  let head = 0;
  let tail = 0;
  queue[tail++] = source;
  parent[source] = -1;
  while (head < tail) {
    const v = queue[head++]!;
    for (let e = offsets[v]!, end = offsets[v + 1]!; e < end; e++) {
      const w = targets[e]!;
      if (parent[w] === -2) {
        parent[w] = v;
        queue[tail++] = w;
      }
    }
  }
  return { parent, last: queue[tail - 1]! };
}

/** Double BFS: a farthest vertex x from the component's first vertex, then a shortest path from x to a farthest y. */
function diameterPath(g: Graph, component: Uint8Array): number[] {
  const first = component.indexOf(1);
  const x = bfs(g, first).last;
  const { parent, last: y } = bfs(g, x);
  const path: number[] = [];
  for (let v = y; v !== -1; v = parent[v]!) path.push(v);
  return path;
}

function startVertices(g: Graph, component: Uint8Array, diameter: number[], count: number): number[] {
  const out: number[] = [];
  const add = (v: number) => {
    if (out.length < count && !out.includes(v)) out.push(v);
  };
  add(diameter[0]!);
  add(diameter[diameter.length - 1]!);
  let low = -1;
  for (let v = 0; v < component.length; v++) if (component[v] && (low < 0 || g.degree(v) < g.degree(low))) low = v;
  add(low);
  return out;
}

