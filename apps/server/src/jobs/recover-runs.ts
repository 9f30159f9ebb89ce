import type { DataSource } from 'typeorm';
import type { Logger } from '../logger';
import { queryRows } from '../services/run-row';
import { MAX_RUN_ATTEMPTS } from './run-claim';
import { enqueueRun, QUEUE_SCHEMA, RUN_QUEUE } from './run-queue';

/** One advisory lock for the recovery, so two processes starting at once do not both re-queue a run. */
const RECOVERY_LOCK = 0x6361_6972; // "cair"

/**
 * Re-queues runs left without a live job: queued or running (with a heartbeat older than staleSeconds)
 * while no job of theirs waits, runs or is due for retry in pg-boss. A process killed between steps, or
 * a job pg-boss gave up on, leaves such runs; a run started too often is failed instead. Jobs still
 * active in pg-boss are left to its expiry, which hands them to another worker. Returns how many runs
 * were re-queued or failed.
 */
export async function recoverRuns(source: DataSource, staleSeconds: number, logger: Logger): Promise<number> {
  return source.transaction(async (manager) => {
    const [lock] = await queryRows<{ ok: boolean }>(manager, `SELECT pg_try_advisory_xact_lock($1) AS ok`, [RECOVERY_LOCK]);
    if (!lock?.ok) return 0;
    const orphans = await queryRows<{ id: string; attempts: number; time_limit_seconds: number | null }>(
      manager,
      `SELECT r.id, r.attempts, r.time_limit_seconds FROM runs r
       WHERE r.status IN ('queued', 'running')
         AND (r.status = 'queued' OR r.heartbeat_at IS NULL OR r.heartbeat_at < now() - make_interval(secs => $2))
         AND NOT EXISTS (
           SELECT 1 FROM ${QUEUE_SCHEMA}.job j WHERE j.name = $1 AND j.state < 'completed' AND j.data->>'runId' = r.id::text)
       ORDER BY r.created_at
       FOR UPDATE OF r SKIP LOCKED`,
      [RUN_QUEUE, staleSeconds],
    );
    for (const run of orphans) {
      if (run.attempts >= MAX_RUN_ATTEMPTS) {
        await manager.query(
          `UPDATE runs SET status = 'failed', error = $2, finished_at = now(), heartbeat_at = NULL, updated_at = now() WHERE id = $1`,
          [run.id, { code: 'attempts_exhausted', message: `the run was started ${run.attempts} times without finishing (its workers stopped or died each time)` }],
        );
        logger.warn({ run: run.id }, 'run failed: too many attempts');
        continue;
      }
      await manager.query(`UPDATE runs SET status = 'queued', worker = NULL, heartbeat_at = NULL, updated_at = now() WHERE id = $1`, [run.id]);
      await enqueueRun(manager, run.id, run.time_limit_seconds, { priority: 1 });
      logger.info({ run: run.id }, 'run without a job re-queued');
    }
    return orphans.length;
  });
}
