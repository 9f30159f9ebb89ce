import { bestUpperBound } from '../bounds/best-upper-bound';
import { gridLowerBounds } from '../bounds/grid-lower-bounds';
import { bestLowerBound } from '../bounds/lower/best-lower-bound';
import type { KnownRectangleValues } from '../bounds/lower/grid-shape';
import type { LowerBound } from '../bounds/lower-bound';
import type { UpperBound } from '../bounds/upper-bound';
import { EngineError } from '../errors';
import { exactTreeDepth, type ExactProgress } from '../exact/exact-tree-depth';
import type { StopReason } from '../exact/search-stop';
import { formulaFor } from '../formulas/formula-for';
import type { Graph } from '../graph/graph';
import { verifyRanking } from '../ranking/verify';

export type SolveMethod = 'auto' | 'exact' | 'bounds' | 'formula';

export interface SolveOptions {
  method?: SolveMethod;
  timeLimitMs?: number;
  signal?: AbortSignal;
  /** A flag shared with another thread: non-zero stops the search, as the signal does (worker threads). */
  stopFlag?: Int32Array;
  onProgress?: (p: ExactProgress) => void;
  /** Memory the exact search's tables may take, in MiB (it then stops with the best interval). */
  memoryLimitMb?: number;
  /** Known rank numbers of full grids (e.g. from the atlas), for rectangle lower bounds. */
  knownRectangle?: KnownRectangleValues;
}

/** The answer of solve; its JSON form is SolveResult in @cairn/schema. */
export interface Solution {
  graph: { vertexCount: number; edgeCount: number; family: Record<string, unknown> | null };
  rankNumber: number | null;
  lower: number;
  upper: number;
  labels: number[];
  provenance: { value: string; lower: { argument: string; source: string }; upper: { construction: string; argument: string } };
  witness: Record<string, unknown> | null;
  verified: boolean;
  stats: { method: SolveMethod; elapsedMs: number; nodes: number; memoSize: number; stopReason: StopReason | null };
}

/**
 * Cairn's one front door. `formula`: the closed form, with the best ranking found as its certificate;
 * `bounds`: the best lower bound against the best construction; `exact`: search within the limits from
 * those bounds; `auto`: the closed form when one applies (still searching, within the limits, for a
 * ranking that meets it), else exact search, which returns the best interval if a limit comes first.
 * Every ranking returned is checked by the verifier before it leaves.
 */
export function solve(g: Graph, options: SolveOptions = {}): Solution {
  const started = Date.now();
  const method = options.method ?? 'auto';
  const formula = method === 'bounds' || method === 'exact' ? undefined : formulaFor(g);
  if (method === 'formula' && !formula) throw new EngineError('no_formula', 'no closed form applies to this graph; use the exact search or the bounds');

  const up: UpperBound = bestUpperBound(g).best;
  const low = lowerBound(g, options);
  let lower = low.value;
  let lowerArgument = low.argument;
  let lowerSource = 'bound';
  let witness: Record<string, unknown> | null = low.witness.kind === 'trivial' ? null : { ...low.witness };
  let upper = up.value;
  let labels = up.labels;
  let construction = up.construction;
  let upperArgument = up.argument;
  if (formula) {
    lower = Math.max(lower, formula.value);
    lowerArgument = `${formula.formula.statement} (${formula.formula.source.title}${formula.formula.source.year ? `, ${formula.formula.source.year}` : ''})`;
    lowerSource = formula.provenance;
    witness = null;
  }
  let nodes = 0;
  let memoSize = 0;
  let stopReason: Solution['stats']['stopReason'] = null;
  let searched = false;
  if (method !== 'bounds' && lower < upper) {
    const exact = exactTreeDepth(g, {
      initial: { labels, value: upper },
      lower,
      ...(options.signal ? { signal: options.signal } : {}),
      ...(options.stopFlag ? { stopFlag: options.stopFlag } : {}),
      ...(options.timeLimitMs !== undefined ? { timeLimitMs: options.timeLimitMs } : {}),
      ...(options.memoryLimitMb !== undefined ? { memoryLimitMb: options.memoryLimitMb } : {}),
      ...(options.onProgress ? { onProgress: options.onProgress } : {}),
    });
    nodes = exact.nodes;
    memoSize = exact.memoSize;
    stopReason = exact.stopReason ?? null;
    if (exact.upper < upper) {
      upper = exact.upper;
      labels = exact.labels;
      construction = 'exact-search';
      upperArgument = `a ranking found by exact search (${upper} labels)`;
    }
    if (exact.lower > lower) {
      lower = exact.lower;
      lowerArgument = `exact search proved no ranking with ${lower - 1} labels exists`;
      lowerSource = 'exact-search';
      witness = null;
    }
    searched = exact.status === 'exact';
  }
  if (formula && upper < formula.value) {
    throw new EngineError('formula_disagrees', `a ranking with ${upper} labels beats the closed form ${formula.formula.id} (${formula.value}): a bug to report`);
  }
  const verdict = verifyRanking(g, labels);
  if (!verdict.valid) throw new EngineError('certificate_invalid', `the ${construction} ranking failed verification: a bug to report`);
  const proven = lower === upper;
  let value = 'bound'; // the interval, each side with its argument
  if (proven && formula) value = formula.provenance;
  else if (proven && (searched || lowerSource === 'exact-search')) value = 'exact-search';
  return {
    graph: { vertexCount: g.vertexCount, edgeCount: g.edgeCount, family: g.family ? { ...g.family } : null },
    rankNumber: proven ? lower : null,
    lower,
    upper,
    labels: Array.from(labels),
    provenance: { value, lower: { argument: lowerArgument, source: lowerSource }, upper: { construction, argument: upperArgument } },
    witness,
    verified: verdict.maxLabel === upper,
    stats: { method, elapsedMs: Date.now() - started, nodes, memoSize, stopReason },
  };
}

/** The best lower bound: the general ones, and for full grids the size-only ones. */
function lowerBound(g: Graph, options: SolveOptions): LowerBound {
  const general = bestLowerBound(g, options.knownRectangle ? { knownRectangle: options.knownRectangle } : {}).best;
  if (g.family?.kind !== 'grid') return general;
  const grid = gridLowerBounds(g.family.rows, g.family.cols)[0]!;
  return grid.value > general.value ? { value: grid.value, witness: { kind: 'trivial' }, argument: grid.argument } : general;
}
