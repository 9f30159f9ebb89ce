import { bestUpperBound } from '../bounds/best-upper-bound';
import { Bitset } from '../graph/bitset';
import type { Graph } from '../graph/graph';
import { containedRectangles } from './contained-rectangles';
import { SearchStopped, type StopReason } from './search-stop';
import { TreeDepthSearch } from './tree-depth-search';

export interface ExactProgress {
  lower: number;
  upper: number;
  nodes: number;
  memoSize: number;
  elapsedMs: number;
}

export interface ExactOptions {
  signal?: AbortSignal;
  /** A flag shared with another thread: non-zero stops the search, as the signal does. */
  stopFlag?: Int32Array;
  timeLimitMs?: number;
  onProgress?: (p: ExactProgress) => void;
  /** A ranking to start from (its largest label is the first upper bound); bestUpperBound's otherwise. */
  initial?: { labels: Int32Array; value: number };
  /** A lower bound already proven elsewhere, where deepening may start. */
  lower?: number;
  /** Memory the search's tables may take, in MiB; it stops with its interval there ('memory-limit'). */
  memoryLimitMb?: number;
}

export interface ExactResult {
  /** 'exact' when lower = upper was proven; 'stopped' when a limit came first. */
  status: 'exact' | 'stopped';
  stopReason?: StopReason;
  lower: number;
  upper: number;
  /** The best ranking found: it uses `upper` labels and passes verifyRanking. */
  labels: Int32Array;
  nodes: number;
  memoSize: number;
  elapsedMs: number;
}

/**
 * The exact rank number (tree-depth) of g by search, anytime: it deepens "td <= k" from the lower bound
 * up, reports each proven step, and when the signal or the time limit stops it returns the proven
 * interval [lower, upper] with the best ranking known.
 */
export function exactTreeDepth(g: Graph, options: ExactOptions = {}): ExactResult {
  const started = Date.now();
  const n = g.vertexCount;
  const start = options.initial ?? bestUpperBound(g).best;
  let upper = start.value;
  let labels = start.labels;
  const search = new TreeDepthSearch(g, {
    signal: options.signal,
    stopFlag: options.stopFlag,
    deadline: options.timeLimitMs === undefined ? undefined : started + options.timeLimitMs,
    memoryBytes: options.memoryLimitMb === undefined ? undefined : options.memoryLimitMb * 2 ** 20,
  });
  const all = Bitset.full(n);
  let lower = n === 0 ? 0 : Math.max(1, Math.min(options.lower ?? 1, upper));
  const report = () =>
    options.onProgress?.({ lower, upper, nodes: search.nodes, memoSize: search.memo.size, elapsedMs: Date.now() - started });
  const finish = (status: ExactResult['status'], stopReason?: ExactResult['stopReason']): ExactResult => ({
    status,
    ...(stopReason ? { stopReason } : {}),
    lower,
    upper,
    labels,
    nodes: search.nodes,
    memoSize: search.memo.size,
    elapsedMs: Date.now() - started,
  });
  try {
    if (options.signal?.aborted) throw new SearchStopped('aborted');
    lower = Math.max(lower, Math.min(upper, search.provenLower(all)));
    report();
    const kind = g.family?.kind;
    if (kind === 'grid' || kind === 'mask' || kind === 'staircase') {
      // Solve the sub-rectangles first, smallest first (issue plan: tabulate the rectangles inside the
      // target). td never grows on subgraphs, so each one's value bounds the whole shape below, and so
      // does every lower bound proven on the way to it (kept when a limit stops the search there).
      const raise = (proven: number) => {
        if (Math.min(upper, proven) <= lower) return;
        lower = Math.min(upper, proven);
        report();
      };
      for (const rect of containedRectangles(g)) {
        if (lower >= upper) break; // the start's ranking is optimal already: the rest would prove nothing new
        raise(search.treeDepth(rect.cells(), raise));
        report(); // the node count moves on even when the bound does not
      }
    }
    while (lower < upper) {
      if (search.atMost(all, lower)) {
        const found = new Int32Array(n);
        search.label(all, lower, found);
        labels = found;
        upper = lower;
      } else {
        lower++;
      }
      report();
    }
    return finish('exact');
  } catch (err) {
    if (err instanceof SearchStopped) {
      report();
      return finish('stopped', err.reason);
    }
    throw err;
  }
}
