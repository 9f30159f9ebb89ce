import { hostname } from 'node:os';
import { EnginePool } from '@cairn/engine/pool';
import PgBoss from 'pg-boss';
import type { ServerContext } from '../context';
import { recoverRuns } from './recover-runs';
import { executeRunJob, type ExecutorDeps } from './run-executor';
import { QUEUE_SCHEMA, RUN_QUEUE, runQueueSender, type RunJobData } from './run-queue';
import { loadQueueSettings, type QueueSettings } from './queue-settings';

/** The run queue's part of a process, as the app and the entry points hold it. */
export interface Jobs {
  close(): Promise<void>;
}

/** The run workers of this process, once started. */
export interface RunJobs extends Jobs {
  /** Resolves once the queue is installed, maintenance runs and the workers (if any) take jobs. */
  ready: Promise<void>;
  /** `${hostname}:${pid}`: what the runs' `worker` column records for this process. */
  worker: string;
  concurrency: number;
}

const START_RETRY_MS = 5000;

/** Where the queue connects: the database the data source uses (a test's own one), else the configured URL. */
function queueDatabaseUrl(ctx: ServerContext): string {
  const { url } = ctx.db.source.options as { url?: string };
  return url ?? ctx.config.databaseUrl;
}

/**
 * Starts the run queue's part of this process on pg-boss: its maintenance (which hands the jobs of
 * workers that died, past their expiry, to others), a periodic look for runs left without a job, and
 * ctx.config.runConcurrency run workers on one engine pool (0 serves the API only). The database may
 * be away at start: it keeps trying until it answers. Closing stops taking jobs and gives running runs
 * back to the queue, so they are computed again later; nothing is marked failed.
 */
export function startJobs(ctx: ServerContext, settings: QueueSettings = loadQueueSettings()): RunJobs {
  const concurrency = ctx.config.runConcurrency;
  const worker = `${hostname()}:${process.pid}`;
  const closing = new AbortController();
  const log = ctx.logger.child({ part: 'run-queue', worker });
  let boss: PgBoss | undefined;
  let pool: EnginePool | undefined;
  let recovery: NodeJS.Timeout | undefined;
  let retry: NodeJS.Timeout | undefined;

  const recover = async (source: Parameters<typeof recoverRuns>[0]) => {
    try {
      const n = await recoverRuns(source, settings.staleSeconds, log);
      if (n > 0) log.info({ runs: n }, 'runs without a job recovered');
    } catch (err) {
      log.warn({ err }, 'looking for runs without a job failed');
    }
  };

  const start = async (): Promise<void> => {
    const source = await ctx.db.connect();
    await runQueueSender(source);
    const b = new PgBoss({
      connectionString: queueDatabaseUrl(ctx),
      schema: QUEUE_SCHEMA,
      application_name: 'cairn-run-queue',
      max: Math.max(2, concurrency + 1),
      migrate: false,
      schedule: false,
      supervise: true,
      maintenanceIntervalSeconds: settings.maintenanceSeconds,
    });
    b.on('error', (err) => log.warn({ err }, 'run queue error'));
    boss = b;
    await b.start();
    if (closing.signal.aborted) return;
    await recover(source);
    recovery = setInterval(() => void recover(source), settings.recoverySeconds * 1000);
    if (concurrency === 0) return;
    // One thread per run worker unless configured: a run waiting for a thread would spend its time limit waiting.
    pool = new EnginePool({ size: ctx.config.engineThreads ?? concurrency, ...(ctx.config.engineMemoryMb ? { memoryLimitMb: ctx.config.engineMemoryMb } : {}) });
    const deps: ExecutorDeps = { ctx, source, pool, worker, settings, closing: closing.signal };
    for (let i = 0; i < concurrency; i++) {
      await b.work<RunJobData>(RUN_QUEUE, { pollingIntervalSeconds: settings.pollSeconds, batchSize: 1 }, async ([job]) => {
        if (!job) return;
        try {
          await executeRunJob(deps, job.data.runId);
        } catch (err) {
          log.error({ err, run: job.data.runId }, 'run job failed; the queue hands it out again');
          throw err;
        }
      });
    }
  };

  let settle!: () => void;
  const ready = new Promise<void>((resolve) => (settle = resolve));
  const attempt = () => {
    retry = undefined;
    start().then(
      () => {
        if (!closing.signal.aborted) log.info({ concurrency }, concurrency > 0 ? 'run workers taking jobs' : 'run queue ready (no workers in this process)');
        settle();
      },
      async (err: unknown) => {
        await boss?.stop({ graceful: false, wait: true }).catch(() => {});
        boss = undefined;
        if (closing.signal.aborted) return settle();
        log.warn({ err }, `run queue not started; trying again in ${START_RETRY_MS / 1000} s`);
        retry = setTimeout(attempt, START_RETRY_MS);
      },
    );
  };
  attempt();

  let closed: Promise<void> | undefined;
  return {
    ready,
    worker,
    concurrency,
    close: () =>
      (closed ??= (async () => {
        closing.abort();
        if (retry) {
          // Waiting to try again: there is nothing started to stop.
          clearTimeout(retry);
          settle();
        }
        await ready;
        clearInterval(recovery);
        // Running attempts see `closing`, stop their search and give their run back; stop() waits for them.
        await boss?.stop({ graceful: true, wait: true, timeout: 30_000 });
        await pool?.close();
      })()),
  };
}
