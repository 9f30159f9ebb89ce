import { availableParallelism, totalmem } from 'node:os';
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import { EngineError } from '../errors';
import { fromTransferred } from './engine-error-transfer';
import { isStarted, type EngineTask, type EngineTaskResult, type ExactProgress, type WorkerMessage, type WorkerReply } from './task';

export interface EnginePoolOptions {
  /** Worker threads; the machine's core count by default. */
  size?: number;
  /**
   * Memory per worker, in MiB: the V8 heap limit (a task beyond it fails, the pool carries on) and the
   * exact search's table budget (its tables are typed arrays outside the heap; at the budget the search
   * stops with its proven interval). Without it the search may take a quarter of the machine's memory
   * per worker.
   */
  memoryLimitMb?: number;
  /** How long a cancelled or overdue task may take to stop by itself before its worker is ended. */
  graceMs?: number;
}

export interface RunOptions {
  signal?: AbortSignal;
  onProgress?: (p: ExactProgress) => void;
}

const fromSource = import.meta.url.endsWith('.ts');

/**
 * Runs engine tasks on worker threads (piscina). A cancelled task is first asked to stop through a
 * shared flag, so a search returns its best interval; only if it does not stop within the grace period
 * is its worker ended. A worker that crashes or runs out of memory fails its own task with a clear
 * error, and the pool starts a fresh worker for the next.
 */
export class EnginePool {
  private readonly piscina: Piscina;
  private readonly graceMs: number;
  readonly size: number;
  readonly memoryLimitMb: number | undefined;
  /** The exact search's table budget per task, in MiB. */
  readonly searchMemoryMb: number;

  constructor(options: EnginePoolOptions = {}) {
    this.size = Math.max(1, options.size ?? availableParallelism());
    this.graceMs = options.graceMs ?? 2000;
    this.memoryLimitMb = options.memoryLimitMb;
    this.searchMemoryMb = options.memoryLimitMb ?? Math.floor(totalmem() / 2 ** 20 / 4);
    const filename = new URL(fromSource ? './worker.ts' : './worker.js', import.meta.url).href;
    this.piscina = new Piscina({
      filename,
      minThreads: 0,
      maxThreads: this.size,
      idleTimeout: 30_000,
      // From source (tests, tsx), workers need the TypeScript loader too: registering it in this thread
      // does not reach them on Node 20.
      ...(fromSource ? { execArgv: [...process.execArgv, '--import', import.meta.resolve('tsx')] } : {}),
      ...(options.memoryLimitMb ? { resourceLimits: { maxOldGenerationSizeMb: options.memoryLimitMb } } : {}),
    });
  }

  /** Runs one task; resolves with its result, rejects with an EngineError when it cannot finish. */
  async run(task: EngineTask, options: RunOptions = {}): Promise<EngineTaskResult> {
    const stop = new SharedArrayBuffer(4);
    const flag = new Int32Array(stop);
    const { port1, port2 } = new MessageChannel();
    const hardStop = new AbortController();
    let killTimer: NodeJS.Timeout | undefined;
    const softStop = () => {
      Atomics.store(flag, 0, 1);
      killTimer ??= setTimeout(() => hardStop.abort(), this.graceMs);
    };
    if (options.signal?.aborted) softStop();
    options.signal?.addEventListener('abort', softStop, { once: true });
    // A search honours its own time limit; the pool only steps in if the worker does not come back. The
    // clock starts when a worker takes the task (its first message), not while it waits in the queue or
    // a new thread starts up.
    let overdue: NodeJS.Timeout | undefined;
    port1.on('message', (m: unknown) => {
      if (isStarted(m)) {
        if (task.kind === 'solve' && task.timeLimitMs !== undefined) overdue ??= setTimeout(softStop, task.timeLimitMs + this.graceMs);
      } else options.onProgress?.(m as ExactProgress);
    });
    const message: WorkerMessage = { task, port: port2, stop, searchMemoryMb: this.searchMemoryMb };
    let reply: WorkerReply;
    try {
      reply = (await this.piscina.run(message, { transferList: [port2], signal: hardStop.signal })) as WorkerReply;
    } catch (err) {
      throw describeFailure(err, hardStop.signal.aborted, this.memoryLimitMb);
    } finally {
      clearTimeout(killTimer);
      clearTimeout(overdue);
      options.signal?.removeEventListener('abort', softStop);
      port1.close();
    }
    if (reply.kind === 'error') throw fromTransferred(reply.error);
    return reply;
  }

  /** Ends every worker; tasks still running fail. */
  async close(): Promise<void> {
    await this.piscina.destroy();
  }
}

function describeFailure(err: unknown, killed: boolean, memoryLimitMb: number | undefined): EngineError {
  const e = err as { code?: string; message?: string; name?: string };
  if (killed) return new EngineError('task_killed', 'the task did not stop when asked, so its worker was ended');
  if (e?.code === 'ERR_WORKER_OUT_OF_MEMORY') {
    return new EngineError('out_of_memory', `the task ran out of memory${memoryLimitMb ? ` (limit ${memoryLimitMb} MiB per worker)` : ''}`);
  }
  if (err instanceof EngineError) return err;
  return new EngineError('worker_failed', `the task failed: ${e?.message ?? String(err)}`);
}
