import type { GraphSpec } from '../spec/graph-spec';
import type { Solution, SolveMethod } from '../solve/solve';
import type { RankingVerdict } from '../ranking/verify';
import type { ExactProgress } from '../exact/exact-tree-depth';

/** Work the pool runs on a worker thread; everything in it crosses threads by structured clone. */
export type EngineTask =
  | {
      kind: 'solve';
      /** A spec, text or JSON form; files it names come in `files` (path -> content). */
      spec: GraphSpec | string;
      files?: Record<string, string>;
      method?: SolveMethod;
      timeLimitMs?: number;
    }
  | { kind: 'verify'; spec: GraphSpec | string; files?: Record<string, string>; labels: number[] };

export type EngineTaskResult = { kind: 'solve'; solution: Solution } | { kind: 'verify'; verdict: RankingVerdict };

/** What a worker answers: a result, or an engine error in a form that survives the thread boundary. */
export type WorkerReply = EngineTaskResult | { kind: 'error'; error: import('./engine-error-transfer').TransferredEngineError };

/** What the worker receives: the task, a port for progress, and the shared stop flag. */
export interface WorkerMessage {
  task: EngineTask;
  port: import('node:worker_threads').MessagePort;
  stop: SharedArrayBuffer;
  /** The exact search's table budget, in MiB (see EnginePoolOptions.memoryLimitMb). */
  searchMemoryMb: number;
}

export type { ExactProgress };

/** The worker's first message on a task's port: it has taken the task (the pool's overdue clock starts). */
export const STARTED = { started: true } as const;

export function isStarted(m: unknown): boolean {
  return typeof m === 'object' && m !== null && (m as { started?: unknown }).started === true;
}
