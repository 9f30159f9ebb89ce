// Load, part 4 of the reliability issue: autocannon on loopback against the built server with the demo
// data, on three cases: GET /api/v1/atlas, GET /api/v1/runs/:id (a finished run) and POST /api/v1/runs
// (a distinct spec per request, path:N for increasing N, so that each is a new run; the server only
// queues them: CAIRN_RUN_CONCURRENCY=0; the demo researcher's limit of runs queued or running at once,
// 20 by default, is raised here with CAIRN_MAX_ACTIVE_RUNS_RESEARCHER, as thousands are submitted). Each
// case must see no connection errors, no timeouts and no answer outside 2xx; every submitted run must be
// in PostgreSQL afterwards. Latencies are recorded in
// bench/results/reliability.json (key "load"), never asserted: tests do not assert wall-clock times.
//
// Short form (the test command): 5 s a case, 20 connections. The full form, 30 s and 50 connections, is
// `pnpm --dir bench load` (CAIRN_LOAD_SECONDS and CAIRN_LOAD_CONNECTIONS override either).
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import { dirname, join } from 'node:path';
import autocannon, { type Options, type Result } from 'autocannon';
import type { RunView } from '@cairn/schema';
import { createDataSource, createLogger, Database, loadDemoData } from '@cairn/server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startBuiltServer, type BuiltServer } from '../support/built-server';
import { databaseUrl, repoRoot } from '../support/test-env';
import { api, sql, waitForRun } from '../integration/run-processes';

const SECONDS = Number(process.env.CAIRN_LOAD_SECONDS ?? 5);
const CONNECTIONS = Number(process.env.CAIRN_LOAD_CONNECTIONS ?? 20);
if (!(SECONDS > 0) || !Number.isInteger(CONNECTIONS) || CONNECTIONS < 1) throw new Error(`CAIRN_LOAD_SECONDS must be > 0 and CAIRN_LOAD_CONNECTIONS a whole number >= 1`);
const FORM = SECONDS === 5 && CONNECTIONS === 20 ? 'short' : SECONDS === 30 && CONNECTIONS === 50 ? 'full' : `custom-${SECONDS}s-${CONNECTIONS}c`;
const CASE_TIMEOUT_MS = SECONDS * 1000 + 90_000;
const RESULTS = join(repoRoot, 'bench/results/reliability.json');
/** The per-member limit of active runs on the server under load: far above what a case can submit. */
const MAX_ACTIVE_RUNS = 1_000_000;
/** path:N of the submissions start here, above any path the other test files submit on this database. */
const FIRST_PATH = 100_000;

let db: Database;
let server: BuiltServer;
let authorization: string;
let finishedRunId: string;

/** Runs one autocannon case to its end (callback form: the promise form hides reqError details). */
function cannon(title: string, options: Omit<Options, 'url' | 'connections' | 'duration'>): Promise<{ result: Result; reqErrors: string[] }> {
  const reqErrors: string[] = [];
  return new Promise((resolve, reject) => {
    const instance = autocannon({ url: server.url, connections: CONNECTIONS, duration: SECONDS, timeout: 10, title, ...options }, (err, result) =>
      err ? reject(err) : resolve({ result, reqErrors }),
    );
    instance.on('reqError', (e: Error) => {
      if (reqErrors.length < 20) reqErrors.push(String(e));
    });
  });
}

interface CaseFigures {
  requests: number;
  requestsPerSecond: number;
  latencyMs: { p50: number; p99: number; average: number; max: number };
  errors: number;
  timeouts: number;
  non2xx: number;
  statusCodes: Record<string, number>;
  durationSeconds: number;
  [extra: string]: unknown;
}

function figuresOf(r: Result): CaseFigures {
  return {
    requests: r['2xx'] + r.non2xx,
    requestsPerSecond: Math.round(r.requests.average * 10) / 10,
    latencyMs: { p50: r.latency.p50, p99: r.latency.p99, average: Math.round(r.latency.average * 100) / 100, max: r.latency.max },
    errors: r.errors,
    timeouts: r.timeouts,
    non2xx: r.non2xx,
    statusCodes: Object.fromEntries(Object.entries(r.statusCodeStats).map(([code, s]) => [code, s.count])),
    durationSeconds: r.duration,
  };
}

/**
 * Merges this form's figures into bench/results/reliability.json under "load", keeping every other key
 * (another suite writes "faults" keys there): read, change one key, write through a temporary file.
 */
function record(caseName: string, figures: CaseFigures): void {
  mkdirSync(dirname(RESULTS), { recursive: true });
  const all = existsSync(RESULTS) ? (JSON.parse(readFileSync(RESULTS, 'utf8')) as Record<string, unknown>) : {};
  const load = (all.load ?? {}) as Record<string, { cases?: Record<string, CaseFigures> }>;
  const form = load[FORM] ?? {};
  load[FORM] = {
    ...form,
    recordedAt: new Date().toISOString(),
    secondsPerCase: SECONDS,
    connections: CONNECTIONS,
    auth: 'the demo researcher’s API key (Authorization: Bearer)',
    server: `built server (apps/server/dist/main.js) on loopback, CAIRN_RUN_CONCURRENCY=0, CAIRN_MAX_ACTIVE_RUNS_RESEARCHER=${MAX_ACTIVE_RUNS}, log level warn`,
    machine: { cpus: os.cpus().length, cpuModel: os.cpus()[0]?.model ?? 'unknown', memoryGiB: Math.round(os.totalmem() / 2 ** 30), node: process.version, platform: `${os.platform()} ${os.release()}` },
    cases: { ...form.cases, [caseName]: figures },
  } as (typeof load)[string];
  all.load = load;
  const tmp = `${RESULTS}.${process.pid}.tmp`;
  writeFileSync(tmp, `${JSON.stringify(all, null, 2)}\n`);
  renameSync(tmp, RESULTS);
}

function expectClean(name: string, { result, reqErrors }: { result: Result; reqErrors: string[] }): void {
  const summary = JSON.stringify({ ...figuresOf(result), reqErrors });
  expect(result['2xx'], `${name}: nothing answered ${summary}`).toBeGreaterThan(0);
  expect(result.errors, `${name}: connection errors ${summary}`).toBe(0);
  expect(result.timeouts, `${name}: timeouts ${summary}`).toBe(0);
  expect(result.non2xx, `${name}: answers outside 2xx ${summary}`).toBe(0);
  expect(result.mismatches, name).toBe(0);
}

/** The body of a GET with the demo key, as the server answers it (what every answer of a case must be). */
async function bodyOf(path: string): Promise<string> {
  const res = await fetch(`${server.url}${path}`, { headers: { authorization } });
  expect(res.status, path).toBe(200);
  return res.text();
}

/** Counts the answers whose body differs from the expected one (autocannon's onResponse). */
function sameBodyAs(expected: string): { onResponse: (status: number, body: string) => void; other: () => number } {
  let other = 0;
  return {
    onResponse: (_status, body) => {
      if (body !== expected) other++;
    },
    other: () => other,
  };
}

const runCount = async () => (await sql<{ n: number }>(`SELECT count(*)::int AS n FROM runs`))[0]!.n;

describe(`load on the built server (${FORM}: ${SECONDS} s a case, ${CONNECTIONS} connections)`, () => {
  beforeAll(async () => {
    db = new Database(createDataSource(databaseUrl()), createLogger('silent'));
    authorization = `Bearer ${(await loadDemoData(await db.connect())).apiKey}`;
    // First a server that computes: the atlas gets entries and there is a finished run to read.
    const worker = await startBuiltServer({ CAIRN_RUN_CONCURRENCY: '1', CAIRN_ENGINE_THREADS: '1' });
    try {
      const ids: string[] = [];
      for (const spec of ['grid:2x29', 'grid:3x7', 'path:613', 'complete:7', 'staircase:3', 'cycle:37']) {
        const res = await api<RunView>(worker.url, 'POST', '/api/v1/runs', authorization, { spec, visibility: 'public', timeLimitSeconds: 30 });
        expect(res.status, JSON.stringify(res.body)).toBeLessThan(300);
        ids.push(res.body.id);
      }
      for (const id of ids) expect((await waitForRun(worker.url, id, authorization)).status).toBe('done');
      finishedRunId = ids[0]!;
    } finally {
      await worker.stop();
    }
    // Then the server under load: it only queues runs, and neither the rate limit nor the per-member limit
    // of active runs (the submissions case queues thousands for one researcher) stands in the way.
    server = await startBuiltServer({ CAIRN_RUN_CONCURRENCY: '0', CAIRN_RATE_LIMIT_PER_MINUTE: '1000000000', CAIRN_MAX_ACTIVE_RUNS_RESEARCHER: String(MAX_ACTIVE_RUNS) });
    const atlas = await api<{ entries?: unknown[] }>(server.url, 'GET', '/api/v1/atlas', authorization);
    expect(atlas.status).toBe(200);
    expect(JSON.stringify(atlas.body)).toContain('grid');
  }, 120_000);

  afterAll(async () => {
    await server?.stop();
    // The submissions only queued runs; leave the shared database without them (and their jobs), so the
    // test files after this one do not wait behind thousands of queued paths.
    if (db) {
      const source = await db.connect();
      const mine = `SELECT id::text FROM runs WHERE family = 'path' AND (spec->>'n')::int >= ${FIRST_PATH}`;
      await source.query(`DELETE FROM pgboss.job WHERE data->>'runId' IN (${mine})`);
      await source.query(`DELETE FROM runs WHERE family = 'path' AND (spec->>'n')::int >= ${FIRST_PATH}`);
      await db.close();
    }
  });

  it('GET /api/v1/atlas: every answer 2xx, no errors', async () => {
    // The path goes in `requests` (autocannon's url is the server's root, the web app), and every answer
    // must be the atlas as read before the case (nothing computes meanwhile).
    const check = sameBodyAs(await bodyOf('/api/v1/atlas'));
    const run = await cannon('GET /api/v1/atlas', { method: 'GET', headers: { authorization }, requests: [{ method: 'GET', path: '/api/v1/atlas', onResponse: check.onResponse }] });
    record('GET /api/v1/atlas', figuresOf(run.result));
    expectClean('atlas', run);
    expect(check.other(), 'answers other than the atlas').toBe(0);
    expect(Object.keys(run.result.statusCodeStats)).toEqual(['200']);
  }, CASE_TIMEOUT_MS);

  it('GET /api/v1/runs/:id of a finished run: every answer 2xx, no errors', async () => {
    const run = await cannon('GET /api/v1/runs/:id', { method: 'GET', headers: { authorization }, requests: [{ method: 'GET', path: `/api/v1/runs/${finishedRunId}` }] });
    record('GET /api/v1/runs/:id', figuresOf(run.result));
    expectClean('run by id', run);
    expect(Object.keys(run.result.statusCodeStats)).toEqual(['200']);
  }, CASE_TIMEOUT_MS);

  it('POST /api/v1/runs with a new spec each time: every answer 202, and every run it announced is in PostgreSQL', async () => {
    const before = await runCount();
    let n = FIRST_PATH;
    /** Specs handed to autocannon (a request may be built and never sent when the case ends). */
    const prepared = new Set<string>();
    /** What each 2xx answer announced: run id → graph key (path:N). */
    const announced = new Map<string, string>();
    /** Answers whose run is not the graph their request asked for. */
    const crossed: string[] = [];
    const run = await cannon('POST /api/v1/runs', {
      requests: [
        {
          method: 'POST',
          path: '/api/v1/runs',
          headers: { authorization, 'content-type': 'application/json' },
          setupRequest: (request, context) => {
            const spec = `path:${n++}`;
            prepared.add(spec);
            context.spec = spec;
            return { ...request, body: JSON.stringify({ spec, timeLimitSeconds: 5 }) };
          },
          onResponse: (status, body, context) => {
            if (status < 200 || status >= 300) return;
            const view = JSON.parse(body) as RunView;
            announced.set(view.id, view.graphKey);
            if (view.graphKey !== context.spec && crossed.length < 10) crossed.push(`${view.id}: ${view.graphKey} for ${String(context.spec)}`);
          },
        },
      ],
    });
    const figures = figuresOf(run.result);
    // A request that was in flight when the case ended may still make its run: wait until the count settles.
    let after = await runCount();
    for (let still = 0; still < 3; ) {
      await new Promise((r) => setTimeout(r, 300));
      const now = await runCount();
      still = now === after ? still + 1 : 0;
      after = now;
    }
    const created = after - before;
    const unanswered = created - announced.size;
    record('POST /api/v1/runs', { ...figures, runsAnnounced: announced.size, runsInPostgres: created, runsFromRequestsCutOffAtTheEnd: unanswered });
    expectClean('submissions', run);
    expect(Object.keys(run.result.statusCodeStats), 'each spec is new, so each answer is 202 Accepted').toEqual(['202']);
    expect(announced.size, 'every 2xx answer was seen with its run').toBe(run.result['2xx']);
    expect(new Set(announced.values()).size, 'no two answers announced the same spec').toBe(announced.size);

    // Every announced run is there, queued (nobody computes here), with the spec it was asked for.
    const ids = [...announced.keys()];
    expect(crossed, 'each answer is the run of its own request').toEqual([]);
    const rows = await sql<{ id: string; graph_key: string; status: string }>(`SELECT id, graph_key, status FROM runs WHERE id = ANY($1::uuid[])`, [ids]);
    expect(rows.length, 'announced runs found in PostgreSQL').toBe(ids.length);
    expect(rows.filter((r) => r.status !== 'queued').map((r) => `${r.id}: ${r.status}`)).toEqual([]);
    expect(rows.filter((r) => r.graph_key !== announced.get(r.id)).map((r) => `${r.id}: ${r.graph_key} vs ${announced.get(r.id)}`)).toEqual([]);

    // The count matches: runs in PostgreSQL = 2xx submissions, except runs of requests that autocannon cut
    // off at the end of the case (sent, answered after it stopped listening): at most one per connection,
    // and each of them one of the specs it prepared.
    expect(unanswered, `runs in PostgreSQL (${created}) minus 2xx submissions (${announced.size})`).toBeGreaterThanOrEqual(0);
    expect(unanswered).toBeLessThanOrEqual(CONNECTIONS);
    if (unanswered > 0) {
      const extra = await sql<{ graph_key: string }>(`SELECT graph_key FROM runs WHERE created_at >= $1 AND NOT (id = ANY($2::uuid[]))`, [run.result.start, ids]);
      expect(extra.length).toBe(unanswered);
      for (const e of extra) expect(prepared.has(e.graph_key), e.graph_key).toBe(true);
    }
    // And the server logged no error while under load.
    expect(server.output()).not.toMatch(/"level":(50|60)/);
  }, CASE_TIMEOUT_MS);
});
