import type { RunView } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import { createApp, type AppContext } from '../src/index';
import { startJobs, type RunJobs } from '../src/jobs/jobs';
import type { QueueSettings } from '../src/jobs/queue-settings';
import { createLogger } from '../src/logger';
import type { Mailer } from '../src/mail/mailer';
import { serveApp } from './support/listen';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { recordingMailer, testContext } from './support/test-context';

/** The queue turned down for tests: quick polling and maintenance, short expiry and staleness. */
export const FAST_QUEUE: QueueSettings = { pollSeconds: 0.5, maintenanceSeconds: 1, expiryMarginSeconds: 5, staleSeconds: 2, recoverySeconds: 2 };

export interface RunsHarness {
  tdb: TestDatabase;
  source: DataSource;
  ctx: AppContext;
  base: string;
  /** The run workers of this process (started with `workers`), or undefined. */
  jobs: RunJobs | undefined;
  startWorkers(): Promise<RunJobs>;
  stopWorkers(): Promise<void>;
  close(): Promise<void>;
}

/**
 * The whole app on its own test database, on a loopback port, with (optionally) the real run workers of
 * this process: pg-boss in PostgreSQL and the engine's worker threads. Nothing is stood in.
 */
export async function startRunsHarness(label: string, options: { workers?: boolean; mailer?: Mailer; env?: Record<string, string> } = {}): Promise<RunsHarness> {
  const tdb = await createTestDatabase(label);
  const source = await tdb.db.connect();
  const base = testContext(tdb.db, { mailer: options.mailer ?? recordingMailer(), logger: createLogger(process.env.CAIRN_TEST_LOG ?? 'silent') }, { CAIRN_RUN_CONCURRENCY: '1', CAIRN_ENGINE_THREADS: '1', ...options.env });
  let jobs: RunJobs | undefined;
  const ctx: AppContext = { ...base, jobs: { close: async () => jobs?.close() } };
  const served = await serveApp(createApp(ctx));
  const harness: RunsHarness = {
    tdb,
    source,
    ctx,
    base: served.url,
    jobs: undefined,
    async startWorkers() {
      jobs = startJobs(ctx, FAST_QUEUE);
      harness.jobs = jobs;
      await jobs.ready;
      return jobs;
    },
    async stopWorkers() {
      await jobs?.close();
      jobs = undefined;
      harness.jobs = undefined;
    },
    async close() {
      await served.close();
      await harness.stopWorkers();
      await tdb.drop();
    },
  };
  if (options.workers) await harness.startWorkers();
  return harness;
}

/** A JSON request to the API with a Bearer key; answers the status and the parsed body. */
export async function api<T = Record<string, unknown>>(h: Pick<RunsHarness, 'base'>, method: string, path: string, authorization?: string, body?: unknown): Promise<{ status: number; body: T; headers: Headers }> {
  const res = await fetch(`${h.base}${path}`, {
    method,
    headers: { ...(authorization ? { authorization } : {}), ...(body !== undefined ? { 'content-type': 'application/json' } : {}) },
    ...(body !== undefined ? { body: JSON.stringify(body) } : {}),
  });
  const text = await res.text();
  return { status: res.status, body: (text ? JSON.parse(text) : null) as T, headers: res.headers };
}

const FINAL = new Set(['done', 'failed', 'cancelled']);

/** Polls a run until its status is final (or `until` says so); fails the test after timeoutMs. */
export async function waitForRun(h: Pick<RunsHarness, 'base'>, id: string, authorization: string, until: (r: RunView) => boolean = (r) => FINAL.has(r.status), timeoutMs = 30_000): Promise<RunView> {
  const deadline = Date.now() + timeoutMs;
  let last: RunView | undefined;
  while (Date.now() < deadline) {
    const { status, body } = await api<RunView>(h, 'GET', `/api/v1/runs/${id}`, authorization);
    if (status !== 200) throw new Error(`GET run ${id} answered ${status}: ${JSON.stringify(body)}`);
    last = body;
    if (until(body)) return body;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`run ${id} did not get there within ${timeoutMs} ms; last seen ${JSON.stringify(last && { status: last.status, progress: last.progress, error: last.error })}`);
}

/**
 * Tree-depth by its defining recursion over vertex subsets (bitmasks): td(empty) = 0, the maximum over
 * components, and 1 + min over v of td(G - v) for a connected G (standard; Nešetřil & Ossona de Mendez,
 * "Sparsity", 2012). Written here, apart from the engine and the server, for graphs of up to ~20 vertices.
 */
export function bruteTreeDepth(n: number, edges: Iterable<[number, number]>): number {
  const adj = new Array<number>(n).fill(0);
  for (const [u, v] of edges) {
    adj[u]! |= 1 << v;
    adj[v]! |= 1 << u;
  }
  const memo = new Map<number, number>();
  const componentsOf = (set: number): number[] => {
    const out: number[] = [];
    let rest = set;
    while (rest) {
      let comp = rest & -rest;
      let grown = 0;
      while (grown !== comp) {
        grown = comp;
        for (let v = 0; v < n; v++) if (comp & (1 << v)) comp |= adj[v]! & set;
      }
      out.push(comp);
      rest &= ~comp;
    }
    return out;
  };
  const td = (set: number): number => {
    if (set === 0) return 0;
    const known = memo.get(set);
    if (known !== undefined) return known;
    const comps = componentsOf(set);
    let best: number;
    if (comps.length > 1) best = Math.max(...comps.map(td));
    else {
      best = Infinity;
      for (let v = 0; v < n; v++) if (set & (1 << v)) best = Math.min(best, 1 + td(set & ~(1 << v)));
    }
    memo.set(set, best);
    return best;
  };
  return td((1 << n) - 1);
}
