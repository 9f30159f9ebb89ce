import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { EngineError, LabelError, ParseError, SizeError, SpecError, type GraphSpec, type RankingVerdict, type ReadWarning } from '@cairn/engine';

/**
 * Reading a big upload, or building a big graph to verify labels on it, takes the engine a second or more;
 * done on the request thread it would stall every other request. These run the same engine functions on
 * a short-lived worker thread instead. The worker loads the engine from wherever this module resolved it
 * (the built package, or its TypeScript sources in tests and development through tsx), so it needs no
 * build entry of its own.
 * Engine errors come back as the same classes, so callers map them to API errors exactly as inline.
 */

/** A ReadResult without the graph itself, only its counts: what crosses back from the worker. */
export interface ReadSummary {
  graph: { vertexCount: number; edgeCount: number };
  warnings: ReadWarning[];
  warningCount: number;
}

export interface VerifyOutcome {
  verdict: RankingVerdict;
  vertexCount: number;
}

type Task =
  | { kind: 'read'; bytes: Uint8Array; name: string; format: string }
  | { kind: 'verify'; spec: GraphSpec; files: Record<string, Uint8Array>; labels: number[] };

interface SentError {
  kind: 'parse' | 'size' | 'label' | 'spec' | 'engine' | 'other';
  message: string;
  code?: string;
  line?: number;
  column?: number;
  expected?: string;
  found?: string;
  format?: string;
}

type Outcome = { ok: true; value: unknown } | { ok: false; error: SentError };

// Plain JavaScript run with `eval: true`: it loads the engine and answers with one message. The built
// engine is imported by URL; its TypeScript sources are required through tsx's CommonJS hook, registered
// here (on Node 20 neither --import nor ESM loader hooks reach an eval'd worker).
const WORKER_SOURCE = String.raw`
const { parentPort, workerData } = require('node:worker_threads');
(async () => {
  let engine;
  if (workerData.tsx) {
    require(workerData.tsx).register();
    engine = require(workerData.enginePath);
  } else {
    engine = await import(workerData.engineUrl);
  }
  const task = workerData.task;
  const sent = (err) => {
    if (err instanceof engine.ParseError) return { kind: 'parse', message: err.message, line: err.line, column: err.column, expected: err.expected, found: err.found, format: err.format };
    if (err instanceof engine.SizeError) return { kind: 'size', message: err.message };
    if (err instanceof engine.LabelError) return { kind: 'label', message: err.message };
    if (err instanceof engine.SpecError) return { kind: 'spec', message: err.message };
    if (err instanceof engine.EngineError) return { kind: 'engine', code: err.code, message: err.message };
    return { kind: 'other', message: err instanceof Error ? err.message : String(err) };
  };
  try {
    if (task.kind === 'read') {
      const read = engine.readGraphSpec({ family: 'file', file: task.name, format: task.format }, () => task.bytes);
      parentPort.postMessage({ ok: true, value: { graph: { vertexCount: read.graph.vertexCount, edgeCount: read.graph.edgeCount }, warnings: read.warnings, warningCount: read.warningCount } });
    } else {
      const graph = engine.graphFromSpec(task.spec, (path) => {
        if (!(path in task.files)) throw new engine.EngineError('file_missing', 'the task names the file ' + path + ', which was not sent with it');
        return task.files[path];
      });
      parentPort.postMessage({ ok: true, value: { verdict: engine.verifyRanking(graph, task.labels), vertexCount: graph.vertexCount } });
    }
  } catch (err) {
    parentPort.postMessage({ ok: false, error: sent(err) });
  }
})();
`;

interface EngineLocation {
  engineUrl: string;
  /** From source: the engine's entry file and tsx's CommonJS API, which the worker registers first. */
  enginePath?: string;
  tsx?: string;
}

let location: EngineLocation | undefined;

function engineLocation(): EngineLocation {
  if (location) return location;
  const engineUrl = import.meta.resolve('@cairn/engine');
  location = engineUrl.endsWith('.ts') ? { engineUrl, enginePath: fileURLToPath(engineUrl), tsx: createRequire(import.meta.url).resolve('tsx/cjs/api') } : { engineUrl };
  return location;
}

function run<T>(task: Task): Promise<T> {
  const where = engineLocation();
  return new Promise<T>((resolve, reject) => {
    // The bytes are copied, not transferred: the caller still stores them.
    const worker = new Worker(WORKER_SOURCE, { eval: true, workerData: { ...where, task } });
    worker.once('message', (outcome: Outcome) => {
      if (outcome.ok) resolve(outcome.value as T);
      else reject(rebuilt(outcome.error));
      void worker.terminate();
    });
    worker.once('error', reject);
    worker.once('exit', (code) => reject(new Error(`the engine's worker thread stopped without an answer (exit code ${code})`)));
  });
}

function rebuilt(e: SentError): Error {
  let err: Error;
  switch (e.kind) {
    case 'parse':
      err = new ParseError(e.format!, { line: e.line!, column: e.column! }, e.expected!, e.found!);
      break;
    case 'size':
      err = new SizeError(e.message);
      break;
    case 'label':
      err = new LabelError(e.message);
      break;
    case 'spec':
      err = new SpecError(e.message);
      break;
    case 'engine':
      err = new EngineError(e.code!, e.message);
      break;
    default:
      err = new Error(e.message);
  }
  err.message = e.message;
  return err;
}

/** readGraphSpec of one file on a worker thread: the counts and warnings (the graph itself stays there). */
export function readFileOffThread(bytes: Uint8Array, name: string, format: string): Promise<ReadSummary> {
  return run<ReadSummary>({ kind: 'read', bytes, name, format });
}

/** graphFromSpec and verifyRanking on a worker thread. */
export function verifyOffThread(spec: GraphSpec, files: Record<string, Uint8Array>, labels: number[]): Promise<VerifyOutcome> {
  return run<VerifyOutcome>({ kind: 'verify', spec, files, labels });
}
