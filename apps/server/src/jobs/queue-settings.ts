import { z } from 'zod';
import { ConfigError } from '../config';

/** How the run queue polls and recovers; the defaults suit a server, the tests turn them down. */
export interface QueueSettings {
  /** How often an idle run worker asks the queue for a job. */
  pollSeconds: number;
  /** How often the queue's maintenance runs: it hands the jobs of dead workers (past their expiry) to others. */
  maintenanceSeconds: number;
  /** A job expires this long after its run's time limit: the worker is then taken for dead. */
  expiryMarginSeconds: number;
  /** A run whose worker wrote no heartbeat for this long may be taken over (or re-queued when its job is gone). */
  staleSeconds: number;
  /** How often each process looks for runs left without a job (a lost job, a crash between steps). */
  recoverySeconds: number;
}

const seconds = (fallback: number, min: number) => z.coerce.number().min(min).max(86_400).default(fallback);

const QueueSettingsSchema = z.object({
  CAIRN_QUEUE_POLL_SECONDS: seconds(2, 0.5),
  CAIRN_QUEUE_MAINTENANCE_SECONDS: seconds(30, 1),
  CAIRN_QUEUE_EXPIRY_MARGIN_SECONDS: seconds(60, 1),
  CAIRN_QUEUE_STALE_SECONDS: seconds(20, 1),
  CAIRN_QUEUE_RECOVERY_SECONDS: seconds(60, 1),
});

/** Reads the queue's settings from an environment, naming each variable that is wrong (as loadConfig does). */
export function loadQueueSettings(env: NodeJS.ProcessEnv = process.env): QueueSettings {
  const parsed = QueueSettingsSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new ConfigError(`invalid configuration in the environment:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  return {
    pollSeconds: e.CAIRN_QUEUE_POLL_SECONDS,
    maintenanceSeconds: Math.round(e.CAIRN_QUEUE_MAINTENANCE_SECONDS),
    expiryMarginSeconds: Math.round(e.CAIRN_QUEUE_EXPIRY_MARGIN_SECONDS),
    staleSeconds: e.CAIRN_QUEUE_STALE_SECONDS,
    recoverySeconds: e.CAIRN_QUEUE_RECOVERY_SECONDS,
  };
}
