import { EngineError, type Solution } from '@cairn/engine';
import type { EnginePool, ExactProgress } from '@cairn/engine/pool';
import type { DataSource } from 'typeorm';
import type { ServerContext } from '../context';
import { notifyRunFinished } from '../mail/notifications';
import { engineInputOf, type EngineInput } from '../services/run-engine-input';
import { queryRows } from '../services/run-row';
import { claimRun, MAX_RUN_ATTEMPTS, type ClaimedRun } from './run-claim';
import { enqueueRun } from './run-queue';
import { requeueRun, storeCancelled, storeFailure, storeResult } from './run-store';
import type { QueueSettings } from './queue-settings';

/** How often a working attempt writes its heartbeat and newest progress, and reads the cancel request. */
export const HEARTBEAT_MS = 500;

export interface ExecutorDeps {
  ctx: ServerContext;
  source: DataSource;
  pool: EnginePool;
  /** `${hostname}:${pid}` of this process. */
  worker: string;
  settings: QueueSettings;
  /** Aborted when this process's run workers are closing. */
  closing: AbortSignal;
}

/** Why an attempt stopped its search early. */
type StopReason = 'cancel' | 'closing' | 'lost';

/**
 * The server's own check of a worker's answer, on the graph built from the run's spec: the labels are a
 * ranking of that graph (verifyRanking), use exactly `upper` labels, one per vertex, and the interval is
 * consistent. A reason when it fails, else undefined. The graph is built and checked on the engine's
 * worker pool (a 10^6-vertex certificate takes a few hundred ms, which the event loop must not spend).
 */
export async function rejectCertificate(pool: EnginePool, input: EngineInput, s: Solution): Promise<string | undefined> {
  let answer;
  try {
    answer = await pool.run({ kind: 'verify', spec: input.spec, files: input.files, labels: s.labels });
  } catch (err) {
    if (err instanceof EngineError && err.code === 'label_error') return `the certificate is not one label per vertex: ${err.message}`;
    return `the server could not re-verify it: ${err instanceof Error ? err.message : String(err)}`;
  }
  if (answer.kind !== 'verify') return 'the engine answered a verify task with something else';
  const { verdict } = answer;
  if (!verdict.valid) {
    const v = verdict.violation;
    return `the certificate is not a ranking: vertices ${v.u} and ${v.v} both have label ${v.label} and are joined by a path of smaller labels`;
  }
  if (verdict.maxLabel !== s.upper) return `the certificate uses ${verdict.maxLabel} labels but claims an upper bound of ${s.upper}`;
  if (!(s.lower <= s.upper)) return `the interval [${s.lower}, ${s.upper}] is empty`;
  if (s.rankNumber !== null && (s.rankNumber !== s.lower || s.rankNumber !== s.upper)) return `the rank number ${s.rankNumber} does not match [${s.lower}, ${s.upper}]`;
  return undefined;
}

/**
 * One job of the run queue: claim the run, search on the engine's worker pool with a heartbeat that
 * carries progress out and the cancel request in, re-verify the answer (still under the heartbeat), store it with the atlas
 * in one transaction (only if this attempt still owns the run), then mail the owner if the run was long.
 */
export async function executeRunJob(deps: ExecutorDeps, runId: string): Promise<void> {
  const { ctx, source, settings } = deps;
  const log = ctx.logger.child({ run: runId, worker: deps.worker });
  if (deps.closing.aborted) {
    // Fetched just as this process began to close: the run stays queued, with a new job for another worker.
    await handBack(deps, runId, 0);
    return;
  }
  const claim = await claimRun(source, runId, deps.worker, settings.staleSeconds);
  if (claim.kind === 'nothing') return;
  if (claim.kind === 'busy') {
    // Another attempt is alive: look again once its heartbeat could have gone stale, in case it dies.
    await handBack(deps, runId, settings.staleSeconds);
    return;
  }
  const run = claim.run;
  if (run.attempt > MAX_RUN_ATTEMPTS) {
    await storeFailure(source, run, { code: 'attempts_exhausted', message: `the run was started ${MAX_RUN_ATTEMPTS} times without finishing (its workers stopped or died each time)` });
    log.warn('run failed: too many attempts');
    return;
  }
  if (run.cancelRequested) {
    await storeCancelled(source, run);
    return;
  }
  log.info({ attempt: run.attempt }, 'run started');
  const input = await engineInputOf(source, run.spec);
  if (!input) {
    await storeFailure(source, run, { code: 'graph_missing', message: 'the uploaded graph of this run no longer exists' });
    return;
  }
  const outcome = await search(deps, run, input);
  if (outcome.stop === 'lost') {
    log.info('run deleted or taken over meanwhile; nothing stored');
    return;
  }
  if (outcome.stop === 'closing') {
    const requeued = await requeueRun(source, run);
    log.info({ requeued }, 'worker closing: run given back to the queue');
    return;
  }
  let stored: boolean;
  if ('error' in outcome) {
    stored = outcome.stop === 'cancel' ? await storeCancelled(source, run) : await storeFailure(source, run, outcome.error);
    log.warn({ error: outcome.error, cancelled: outcome.stop === 'cancel' }, 'run ended without a result');
  } else {
    const { rejected } = outcome;
    if (rejected) {
      stored = await storeFailure(source, run, { code: 'certificate_rejected', message: `the server's re-verification refused the result: ${rejected}` });
      log.error({ reason: rejected }, 'certificate rejected');
    } else {
      // A search that finished on its own before it saw the cancel request is done all the same.
      const status = outcome.stop === 'cancel' && outcome.solution.stats.stopReason === 'aborted' ? 'cancelled' : 'done';
      stored = await storeResult(source, run, outcome.solution, status, log);
      log.info({ status, lower: outcome.solution.lower, upper: outcome.solution.upper, stored }, 'run finished');
    }
  }
  if (stored) await notifyRunFinished(ctx, source, run.id);
}

/** A new job for a run this attempt does not work on, due after `afterSeconds`. */
async function handBack(deps: ExecutorDeps, runId: string, afterSeconds: number): Promise<void> {
  const [row] = await queryRows<{ time_limit_seconds: number | null }>(deps.source, `SELECT time_limit_seconds FROM runs WHERE id = $1`, [runId]);
  if (!row) return;
  await deps.source.transaction((m) => enqueueRun(m, runId, row.time_limit_seconds, { startAfterSeconds: afterSeconds, settings: deps.settings }));
}

/** What an attempt's search gave: an answer with the server's verdict on it (see rejectCertificate), or an error. */
type SearchOutcome =
  | { stop: StopReason | undefined; solution: Solution; rejected: string | undefined }
  | { stop: StopReason | undefined; error: { code: string; message: string } };

/** Runs the solve task with the heartbeat loop; stops it on a cancel request, on closing, or when the run is lost. */
async function search(deps: ExecutorDeps, run: ClaimedRun, input: EngineInput): Promise<SearchOutcome> {
  const { source, pool, closing } = deps;
  const controller = new AbortController();
  let stop: StopReason | undefined;
  const stopWith = (why: StopReason) => {
    stop ??= why;
    controller.abort();
  };
  const onClosing = () => stopWith('closing');
  if (closing.aborted) onClosing();
  closing.addEventListener('abort', onClosing, { once: true });
  let pending: ExactProgress | undefined;
  let beating = false;
  const beat = async () => {
    if (beating) return;
    beating = true;
    const progress = pending;
    pending = undefined;
    try {
      const [row] = await queryRows<{ cancel: boolean }>(
        source,
        `UPDATE runs SET heartbeat_at = now(), progress = COALESCE($3, progress), updated_at = now()
         WHERE id = $1 AND status = 'running' AND attempts = $2 RETURNING cancel_requested_at IS NOT NULL AS cancel`,
        [run.id, run.attempt, progress ?? null],
      );
      if (!row) stopWith('lost');
      else if (row.cancel) stopWith('cancel');
    } catch (err) {
      // A database that is briefly away must not stop the search; the result is stored (or retried) later.
      pending ??= progress;
      deps.ctx.logger.warn({ err, run: run.id }, 'heartbeat not written');
    } finally {
      beating = false;
    }
  };
  const timer = setInterval(() => void beat(), HEARTBEAT_MS);
  try {
    const answer = await pool.run(
      { kind: 'solve', spec: input.spec, files: input.files, method: run.method, ...(run.timeLimitSeconds ? { timeLimitMs: run.timeLimitSeconds * 1000 } : {}) },
      { signal: controller.signal, onProgress: (p) => (pending = p) },
    );
    if (answer.kind !== 'solve') return { stop, error: { code: 'worker_failed', message: 'the engine answered a solve task with something else' } };
    // Verified while the heartbeat still runs, so a long check (or one waiting for a thread) never makes
    // the attempt look dead; an attempt that lost its run or is closing stores nothing, so skips it.
    const keeps = stop === undefined || stop === 'cancel';
    return { stop, solution: answer.solution, rejected: keeps ? await rejectCertificate(pool, input, answer.solution) : undefined };
  } catch (err) {
    const error = err instanceof EngineError ? { code: err.code, message: err.message } : { code: 'internal', message: err instanceof Error ? err.message : String(err) };
    return { stop, error };
  } finally {
    clearInterval(timer);
    closing.removeEventListener('abort', onClosing);
  }
}
