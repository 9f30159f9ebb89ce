import type { DataSource } from 'typeorm';
import { queryRows } from '../services/run-row';

/** A run started this many times without finishing is failed rather than started again. */
export const MAX_RUN_ATTEMPTS = 5;

export interface ClaimedRun {
  id: string;
  attempt: number;
  ownerId: string;
  spec: Record<string, unknown>;
  graphKey: string;
  method: 'auto' | 'exact' | 'bounds' | 'formula';
  timeLimitSeconds: number | null;
  cancelRequested: boolean;
}

export type Claim =
  | { kind: 'claimed'; run: ClaimedRun }
  /** Deleted, or finished (done, failed, cancelled): nothing to do. */
  | { kind: 'nothing'; status: string | null }
  /** Another attempt is alive and working on it (its heartbeat is fresh). */
  | { kind: 'busy' };

/**
 * Takes a run for one attempt: a queued run, or a running one whose worker has gone quiet (no heartbeat
 * for staleSeconds: the process died and the job came back after its expiry). The attempt number
 * returned owns the run: only the attempt with that number may store its result.
 */
export async function claimRun(source: DataSource, runId: string, worker: string, staleSeconds: number): Promise<Claim> {
  const [row] = await queryRows<{
    attempts: number;
    owner_id: string;
    spec: Record<string, unknown>;
    graph_key: string;
    method: ClaimedRun['method'];
    time_limit_seconds: number | null;
    cancel_requested_at: Date | null;
  }>(
    source,
    `UPDATE runs SET status = 'running', attempts = attempts + 1, worker = $2, started_at = COALESCE(started_at, now()),
       heartbeat_at = now(), updated_at = now()
     WHERE id = $1 AND (status = 'queued' OR (status = 'running' AND (heartbeat_at IS NULL OR heartbeat_at < now() - make_interval(secs => $3))))
     RETURNING attempts, owner_id, spec, graph_key, method, time_limit_seconds, cancel_requested_at`,
    [runId, worker, staleSeconds],
  );
  if (row) {
    return {
      kind: 'claimed',
      run: {
        id: runId,
        attempt: row.attempts,
        ownerId: row.owner_id,
        spec: row.spec,
        graphKey: row.graph_key,
        method: row.method,
        timeLimitSeconds: row.time_limit_seconds,
        cancelRequested: row.cancel_requested_at !== null,
      },
    };
  }
  const [now] = await queryRows<{ status: string }>(source, `SELECT status FROM runs WHERE id = $1`, [runId]);
  if (now?.status === 'running') return { kind: 'busy' };
  return { kind: 'nothing', status: now?.status ?? null };
}
