import { EngineError } from '../errors';
import { verifyRanking } from '../ranking/verify';
import { solve } from '../solve/solve';
import { graphFromSpec } from '../spec/graph-from-spec';
import { toTransferred } from './engine-error-transfer';
import { STARTED, type EngineTaskResult, type WorkerMessage, type WorkerReply } from './task';

/**
 * The pool's worker: builds the graph from its spec and runs the task. The search is synchronous, so
 * cancellation arrives through the shared stop flag (checked inside the search), not through messages.
 */
export default function runTask(message: WorkerMessage): WorkerReply {
  try {
    return runEngineTask(message);
  } catch (err) {
    if (err instanceof EngineError) return { kind: 'error', error: toTransferred(err) };
    throw err;
  }
}

function runEngineTask({ task, port, stop, searchMemoryMb }: WorkerMessage): EngineTaskResult {
  port.postMessage(STARTED); // the pool's overdue clock starts here
  const files = task.files ?? {};
  const graph = graphFromSpec(task.spec, (path) => {
    const content = files[path];
    if (content === undefined) throw new EngineError('file_missing', `the task names the file ${path}, which was not sent with it`);
    return content;
  });
  try {
    if (task.kind === 'verify') return { kind: 'verify', verdict: verifyRanking(graph, task.labels) };
    const solution = solve(graph, {
      ...(task.method ? { method: task.method } : {}),
      ...(task.timeLimitMs !== undefined ? { timeLimitMs: task.timeLimitMs } : {}),
      stopFlag: new Int32Array(stop),
      memoryLimitMb: searchMemoryMb,
      onProgress: (p) => port.postMessage(p),
    });
    return { kind: 'solve', solution };
  } finally {
    port.close();
  }
}
