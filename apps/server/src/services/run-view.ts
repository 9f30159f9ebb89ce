import type { RunProgress, RunSummary, RunView, SolveResult } from '@cairn/schema';
import { specTextOf } from './run-spec';
import type { RunRow } from './run-row';

const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);

/** Where the share link of a run leads: the web app's page of the shared run. */
export const sharedRunUrl = (publicUrl: string, token: string) => `${publicUrl}/shared/${token}`;

/** A run as lists show it. */
export function toRunSummary(row: RunRow, publicUrl: string): RunSummary {
  const api = `/api/v1/runs/${row.id}`;
  return {
    id: row.id,
    status: row.status,
    spec: row.spec,
    specText: specTextOf(row.spec),
    graphKey: row.graph_key,
    family: row.family,
    method: row.method,
    timeLimitSeconds: row.time_limit_seconds,
    visibility: row.visibility,
    progress: (row.progress as RunProgress | null) ?? null,
    rankNumber: row.rank_number,
    lower: row.lower,
    upper: row.upper,
    provenance: row.provenance?.value ?? null,
    error: row.error,
    owner: { id: row.owner_id, login: row.owner_login },
    sweepId: row.sweep_id,
    attempts: row.attempts,
    cancelRequested: row.cancel_requested_at !== null,
    createdAt: iso(row.created_at)!,
    startedAt: iso(row.started_at),
    finishedAt: iso(row.finished_at),
    links: {
      self: api,
      events: `${api}/events`,
      cancel: `${api}/cancel`,
      export: `${api}/export`,
      web: `${publicUrl}/runs/${row.id}`,
      shared: row.share_token && row.visibility !== 'private' ? sharedRunUrl(publicUrl, row.share_token) : null,
    },
  };
}

/**
 * The engine's SolveResult of a run: the stored result with its certificate put back (the labels are
 * kept once, in the certificate column).
 */
export function solveResultOf(row: RunRow): SolveResult | null {
  if (!row.result || !row.certificate) return null;
  return { ...(row.result as Omit<SolveResult, 'labels'>), labels: row.certificate };
}

/** A whole run. */
export function toRunView(row: RunRow, publicUrl: string): RunView {
  return { ...toRunSummary(row, publicUrl), result: solveResultOf(row) };
}
