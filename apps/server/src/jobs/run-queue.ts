import PgBoss from 'pg-boss';
import type { DataSource, EntityManager } from 'typeorm';
import { pgPoolOf } from '../db/pg-pool';
import { loadQueueSettings, type QueueSettings } from './queue-settings';

/** The pg-boss queue of runs; a job's data names its run, and the run row says what to compute. */
export const RUN_QUEUE = 'cairn-runs';
/** pg-boss keeps its tables in a schema of its own, beside Cairn's. */
export const QUEUE_SCHEMA = 'pgboss';
/** How often pg-boss itself hands a failed job out again before giving up on it. */
export const JOB_RETRY_LIMIT = 3;

export interface RunJobData {
  runId: string;
}

const senders = new WeakMap<DataSource, Promise<PgBoss>>();

/** The pg-boss database interface over TypeORM's own connection pool (no second pool for sending). */
function poolExecutor(source: DataSource): PgBoss.Db {
  const pool = pgPoolOf(source);
  return { executeSql: (text, values) => pool.query(text, values) };
}

/** The pg-boss interface over one open transaction, so a job is written together with its run or not at all. */
function transactionExecutor(manager: EntityManager): PgBoss.Db {
  const runner = manager.queryRunner;
  if (!runner) throw new Error('enqueueRun needs the EntityManager of a transaction');
  return {
    executeSql: async (text, values) => {
      const result = (await runner.query(text, values, true)) as { records?: unknown[] };
      return { rows: result.records ?? [] };
    },
  };
}

/**
 * pg-boss for sending, on the data source's pool: installs pg-boss's schema and the run queue the first
 * time (both idempotent, and safe when several processes start at once), runs no maintenance of its
 * own and holds no timers. One per data source; a failed attempt is forgotten so the next call retries.
 */
export function runQueueSender(source: DataSource): Promise<PgBoss> {
  let sender = senders.get(source);
  if (!sender) {
    sender = (async () => {
      const boss = new PgBoss({ db: poolExecutor(source), schema: QUEUE_SCHEMA, supervise: false, schedule: false, migrate: true });
      await boss.start();
      await boss.createQueue(RUN_QUEUE, { name: RUN_QUEUE, policy: 'standard', retryLimit: JOB_RETRY_LIMIT, retryDelay: 1 });
      return boss;
    })();
    sender.catch(() => senders.delete(source));
    senders.set(source, sender);
  }
  return sender;
}

export interface EnqueueOptions {
  /** Resumed runs go before new ones. */
  priority?: number;
  /** Do not hand the job out before this many seconds. */
  startAfterSeconds?: number;
  settings?: QueueSettings;
}

let defaultSettings: QueueSettings | undefined;

/**
 * Puts a run's job on the queue inside the caller's transaction (call runQueueSender first, outside it).
 * The job expires when the run's time limit plus a margin has passed without it finishing: pg-boss then
 * takes its worker for dead and hands the job to another.
 */
export async function enqueueRun(manager: EntityManager, runId: string, timeLimitSeconds: number | null, options: EnqueueOptions = {}): Promise<string> {
  const settings = options.settings ?? (defaultSettings ??= loadQueueSettings());
  const sender = await runQueueSender(manager.connection);
  const data: RunJobData = { runId };
  const id = await sender.send(RUN_QUEUE, data, {
    db: transactionExecutor(manager),
    expireInSeconds: (timeLimitSeconds ?? 3600) + settings.expiryMarginSeconds,
    retryLimit: JOB_RETRY_LIMIT,
    retryDelay: 1,
    ...(options.priority ? { priority: options.priority } : {}),
    ...(options.startAfterSeconds ? { startAfter: Math.ceil(options.startAfterSeconds) } : {}),
  });
  if (!id) throw new Error(`the run queue did not accept the job of run ${runId}`);
  return id;
}
