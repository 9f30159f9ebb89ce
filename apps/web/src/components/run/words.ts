import type { RunStatus, SolveMethod, SolveResult } from '@cairn/schema';

/** The value of a run or atlas row: the rank number when proven, else the interval it is known to lie in. */
export function valueText(v: { rankNumber: number | null; lower: number | null; upper: number | null }): string {
  if (v.rankNumber !== null) return String(v.rankNumber);
  if (v.lower !== null && v.upper !== null) return v.lower === v.upper ? String(v.lower) : `${v.lower}–${v.upper}`;
  return '—';
}

/** What each method does, in words, for the form and the run page. */
export const METHOD_WORDS: Record<SolveMethod, { name: string; explain: string }> = {
  auto: { name: 'Let Cairn choose', explain: 'A closed form when one is published for the graph, else exact search; if the time runs out you get the best proven interval.' },
  exact: { name: 'Exact search', explain: 'Search every way of splitting the graph for the true rank number, starting from the best bounds; stops at the time limit with an interval.' },
  bounds: { name: 'Bounds only', explain: 'No search: the best lower bound against the best construction. Fast on large graphs; the gap says how far from optimal the ranking may be.' },
  formula: { name: 'Closed form', explain: 'Only a closed form with its source (paths, cycles, complete and complete bipartite graphs, stars, 1- and 2-row grids); refused when none applies.' },
};

export const STATUS_WORDS: Record<RunStatus, string> = {
  queued: 'waiting for a worker',
  running: 'searching',
  done: 'finished',
  failed: 'failed',
  cancelled: 'cancelled',
};

/**
 * How the value is known, in one sentence: "exact: found by exhaustive search", "closed form: <source>",
 * or "between 5 and 6: lower bound by <argument>, upper by <construction>".
 */
export function provenanceWords(result: Pick<SolveResult, 'provenance' | 'lower' | 'upper' | 'rankNumber'>): string {
  const p = result.provenance;
  const upperSide = p.upper.argument && p.upper.argument !== p.upper.construction ? `${p.upper.construction} (${p.upper.argument})` : p.upper.construction;
  if (p.value === 'exact-search') return `exact: found by exhaustive search${p.upper.construction === 'exact-search' ? '' : `; the ranking comes from ${upperSide}`}`;
  if (p.value.startsWith('formula:')) return `closed form: ${p.lower.argument}`;
  if (result.rankNumber !== null || result.lower === result.upper) {
    return `exact: the lower bound by ${p.lower.argument} meets the upper bound by ${upperSide}`;
  }
  return `between ${result.lower} and ${result.upper}: lower bound by ${p.lower.argument}, upper by ${upperSide}`;
}

/** A short label for a provenance code (`exact-search`, `formula:<id>`, `bound`), for tables. */
export function provenanceTag(code: string | null): string {
  if (code === null) return '';
  if (code === 'exact-search') return 'exact search';
  if (code.startsWith('formula:')) return `closed form ${code.slice('formula:'.length)}`;
  if (code === 'bound') return 'bounds';
  return code;
}

/** 950 ms, 12.4 s, 3 min 05 s, 1 h 02 min. */
export function formatDuration(ms: number): string {
  if (!Number.isFinite(ms) || ms < 0) return '—';
  if (ms < 1000) return `${Math.round(ms)} ms`;
  const s = ms / 1000;
  if (s < 60) return `${s < 10 ? s.toFixed(1) : Math.round(s)} s`;
  const m = Math.floor(s / 60);
  if (m < 60) return `${m} min ${String(Math.floor(s % 60)).padStart(2, '0')} s`;
  return `${Math.floor(m / 60)} h ${String(m % 60).padStart(2, '0')} min`;
}

/** Dates as the member's browser writes them, down to the minute. */
export function formatWhen(iso: string | null): string {
  if (!iso) return '—';
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}

/** How long a run took (or has been going), from its timestamps. */
export function runDurationMs(run: { startedAt: string | null; finishedAt: string | null }, now = Date.now()): number | null {
  if (!run.startedAt) return null;
  const end = run.finishedAt ? Date.parse(run.finishedAt) : now;
  return end - Date.parse(run.startedAt);
}

export const numberWords = (n: number) => n.toLocaleString('en');
