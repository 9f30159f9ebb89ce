import type { Solution } from '@cairn/engine';
import type { DataSource } from 'typeorm';
import type { Logger } from '../logger';
import { tightenAtlas } from '../services/atlas';
import { graphKeyOf, type GraphKey, type KeyedSpec } from '../services/graph-key';
import { queryRows } from '../services/run-row';
import type { ClaimedRun } from './run-claim';
import { enqueueRun } from './run-queue';

/** The guard of every write an attempt makes: the run is still running and still this attempt's. */
const OWNED = `id = $1 AND status = 'running' AND attempts = $2`;

/** The atlas key of a claimed run, with the family and sizes the atlas files it under. */
function keyOf(run: ClaimedRun): GraphKey {
  if (run.spec.family === 'upload') return { key: run.graphKey, family: 'upload', sizes: {} };
  const key = graphKeyOf(run.spec as unknown as KeyedSpec);
  return { ...key, key: run.graphKey };
}

/**
 * Stores a verified result (status done, or cancelled keeping its best interval) and tightens the atlas,
 * in one transaction. Exactly once: only the attempt that owns the run writes; a run deleted or taken
 * over meanwhile stores nothing (and the atlas is not touched). Returns whether it was stored.
 */
export async function storeResult(source: DataSource, run: ClaimedRun, s: Solution, status: 'done' | 'cancelled', logger: Logger): Promise<boolean> {
  const { labels, ...result } = s;
  return source.transaction(async (manager) => {
    const updated = await queryRows<{ id: string }>(
      manager,
      `UPDATE runs SET status = $3, result = $4, certificate = $5::jsonb, lower = $6, upper = $7, rank_number = $8, provenance = $9,
         witness = $10, stats = $11, error = NULL, finished_at = now(), heartbeat_at = NULL, updated_at = now()
       WHERE ${OWNED} RETURNING id`,
      [run.id, run.attempt, status, result, JSON.stringify(labels), s.lower, s.upper, s.rankNumber, s.provenance, s.witness, s.stats],
    );
    if (updated.length === 0) return false;
    await tightenAtlas(
      manager,
      {
        key: keyOf(run),
        vertexCount: s.graph.vertexCount,
        edgeCount: s.graph.edgeCount,
        runId: run.id,
        lower: s.lower,
        upper: s.upper,
        lowerProvenance: { ...s.provenance.lower, value: s.provenance.value, method: s.stats.method },
        upperProvenance: { ...s.provenance.upper, verified: true },
      },
      logger,
    );
    return true;
  });
}

/** Stores a failure `{ code, message }`, if the attempt still owns the run. */
export async function storeFailure(source: DataSource, run: Pick<ClaimedRun, 'id' | 'attempt'>, error: { code: string; message: string }): Promise<boolean> {
  const updated = await queryRows<{ id: string }>(
    source,
    `UPDATE runs SET status = 'failed', error = $3, finished_at = now(), heartbeat_at = NULL, updated_at = now() WHERE ${OWNED} RETURNING id`,
    [run.id, run.attempt, error],
  );
  return updated.length > 0;
}

/** A cancel request that came before any bounds: cancelled, with no result. */
export async function storeCancelled(source: DataSource, run: Pick<ClaimedRun, 'id' | 'attempt'>): Promise<boolean> {
  const updated = await queryRows<{ id: string }>(
    source,
    `UPDATE runs SET status = 'cancelled', finished_at = now(), heartbeat_at = NULL, updated_at = now() WHERE ${OWNED} RETURNING id`,
    [run.id, run.attempt],
  );
  return updated.length > 0;
}

/**
 * Gives a run back to the queue when its worker stops (the process is closing): queued again with a new
 * job ahead of new runs, in one transaction, so another worker (or this one after a restart) computes
 * it from the start. Not failed: nothing went wrong with the run.
 */
export async function requeueRun(source: DataSource, run: Pick<ClaimedRun, 'id' | 'attempt' | 'timeLimitSeconds'>): Promise<boolean> {
  return source.transaction(async (manager) => {
    const updated = await queryRows<{ id: string }>(
      manager,
      `UPDATE runs SET status = 'queued', worker = NULL, heartbeat_at = NULL, progress = NULL, updated_at = now() WHERE ${OWNED} RETURNING id`,
      [run.id, run.attempt],
    );
    if (updated.length === 0) return false;
    await enqueueRun(manager, run.id, run.timeLimitSeconds, { priority: 1 });
    return true;
  });
}
