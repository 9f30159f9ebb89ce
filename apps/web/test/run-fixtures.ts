// Runs as the API shows them, for the run-centred page tests (not a test file itself); the fetch stub, the
// providers and the sessions are in ./support/render-page.
import type { RunSummary, RunView, SolveResult } from '@cairn/schema';
import { ME_RESEARCHER } from './support/render-page';

export const RUN_ID = '22222222-2222-4222-8222-222222222222';

export function runSummary(over: Partial<RunSummary> = {}): RunSummary {
  const id = over.id ?? RUN_ID;
  return {
    id,
    status: 'done',
    spec: { family: 'grid', rows: 2, cols: 3 },
    specText: 'grid:2x3',
    graphKey: 'grid:2x3',
    family: 'grid',
    method: 'auto',
    timeLimitSeconds: 60,
    visibility: 'private',
    progress: null,
    rankNumber: 4,
    lower: 4,
    upper: 4,
    provenance: 'exact-search',
    error: null,
    owner: { id: ME_RESEARCHER.user!.id, login: 'ada' },
    sweepId: null,
    attempts: 1,
    cancelRequested: false,
    createdAt: '2025-03-01T10:00:00.000Z',
    startedAt: '2025-03-01T10:00:01.000Z',
    finishedAt: '2025-03-01T10:00:03.500Z',
    links: {
      self: `/api/v1/runs/${id}`,
      events: `/api/v1/runs/${id}/events`,
      cancel: `/api/v1/runs/${id}/cancel`,
      export: `/api/v1/runs/${id}/export`,
      web: `http://cairn.test/runs/${id}`,
      shared: null,
    },
    ...over,
  };
}

/** The 2 x 3 grid ranked 1 3 1 / 2 4 2 (checked by hand: both 1s and both 2s are separated by larger labels). */
export const GRID_RESULT: SolveResult = {
  graph: { vertexCount: 6, edgeCount: 7, family: { kind: 'grid', rows: 2, cols: 3 } },
  rankNumber: 4,
  lower: 4,
  upper: 4,
  labels: [1, 3, 1, 2, 4, 2],
  provenance: { value: 'exact-search', lower: { argument: 'exact search proved no ranking with 3 labels exists', source: 'exact-search' }, upper: { construction: 'exact-search', argument: 'a ranking found by exact search (4 labels)' } },
  witness: null,
  verified: true,
  stats: { method: 'auto', elapsedMs: 2500, nodes: 812, memoSize: 40, stopReason: null },
};

export function runView(over: Partial<RunView> = {}): RunView {
  return { ...runSummary(over), result: over.result === undefined ? GRID_RESULT : over.result };
}
