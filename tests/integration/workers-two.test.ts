import type { RunView } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startBuiltServer, type BuiltServer } from '../support/built-server';
import { api, FAST_QUEUE_ENV, insertMemberWithKey, sql, startWorkerProcess, waitForRun, type WorkerProcess } from './run-processes';

// Two built worker processes (`node apps/server/dist/worker.js`) and a built API process that runs no
// runs itself (CAIRN_RUN_CONCURRENCY=0), all on the one test database: the queue in PostgreSQL shares
// the runs out, each is computed once, and a worker killed mid-run leaves its run to the other.
let server: BuiltServer;
let workers: WorkerProcess[] = [];
let key: string;

beforeAll(async () => {
  server = await startBuiltServer({ CAIRN_RUN_CONCURRENCY: '0', ...FAST_QUEUE_ENV });
  key = await insertMemberWithKey('two-workers', 'researcher');
  workers = [await startWorkerProcess(), await startWorkerProcess()];
}, 60_000);

afterAll(async () => {
  for (const w of workers) await w.stop();
  await server?.stop();
});

const submit = async (body: unknown) => {
  const res = await api<RunView>(server.url, 'POST', '/api/v1/runs', key, body);
  expect(res.status).toBe(202);
  return res.body;
};

describe('two worker processes and an API process', () => {
  it('share out the runs: all finish, both workers compute, none twice', async () => {
    // Each search stops at its 1 s limit, so the runs take long enough for both workers to get some.
    const specs = ['grid:11x12', 'grid:11x13', 'grid:11x14', 'grid:11x15', 'grid:12x13', 'grid:12x14', 'grid:12x15', 'grid:13x14'];
    const runs = [];
    for (const spec of specs) runs.push(await submit({ spec, method: 'exact', timeLimitSeconds: 1 }));
    const finished = await Promise.all(runs.map((r) => waitForRun(server.url, r.id, key)));
    expect(finished.map((r) => r.status)).toEqual(specs.map(() => 'done'));
    for (const r of finished) expect(r.result!.verified).toBe(true);
    const rows = await sql<{ worker: string; attempts: number }>(`SELECT worker, attempts FROM runs WHERE id = ANY($1::uuid[])`, [runs.map((r) => r.id)]);
    expect(rows.map((r) => r.attempts)).toEqual(specs.map(() => 1));
    expect(new Set(rows.map((r) => r.worker))).toEqual(new Set(workers.map((w) => w.name)));
    // Each run's job was handed out and completed exactly once.
    const jobs = await sql<{ run: string; n: number }>(
      `SELECT data->>'runId' AS run, count(*)::int AS n FROM pgboss.job WHERE data->>'runId' = ANY($1) AND state = 'completed' GROUP BY 1`,
      [runs.map((r) => r.id)],
    );
    expect(jobs.map((j) => j.n)).toEqual(specs.map(() => 1));
  }, 90_000);

  it('streams a run computed by another process as server-sent events from the API process', async () => {
    const run = await submit({ spec: 'grid:11x11', method: 'exact', timeLimitSeconds: 2 });
    const res = await fetch(`${server.url}/api/v1/runs/${run.id}/events`, { headers: { authorization: key } });
    expect(res.headers.get('content-type')).toMatch(/^text\/event-stream/);
    const text = await res.text(); // the server ends the stream after the final event
    const events = [...text.matchAll(/^event: (\w+)$/gm)].map((m) => m[1]);
    expect(events).toContain('progress');
    expect(events[events.length - 1]).toBe('done');
  }, 60_000);

  it('finishes the run of a worker killed mid-run on the other worker', async () => {
    const run = await submit({ spec: 'grid:12x16', method: 'exact', timeLimitSeconds: 4 });
    const running = await waitForRun(server.url, run.id, key, (r) => r.status === 'running');
    expect(running.attempts).toBe(1);
    const [{ worker }] = (await sql<{ worker: string }>(`SELECT worker FROM runs WHERE id = $1`, [run.id])) as [{ worker: string }];
    const victim = workers.find((w) => w.name === worker)!;
    const survivor = workers.find((w) => w !== victim)!;
    victim.child.kill('SIGKILL');
    await victim.exited;
    // pg-boss expires the dead worker's job (time limit + margin) and hands it to the survivor.
    const done = await waitForRun(server.url, run.id, key, undefined, 60_000);
    expect(done.status).toBe('done');
    expect(done.result!.verified).toBe(true);
    const [row] = await sql<{ worker: string; attempts: number }>(`SELECT worker, attempts FROM runs WHERE id = $1`, [run.id]);
    expect(row).toEqual({ worker: survivor.name, attempts: 2 });
    const atlas = await sql<{ upper_run_id: string }>(`SELECT upper_run_id FROM atlas_entries WHERE graph_key = 'grid:12x16'`);
    expect(atlas).toEqual([{ upper_run_id: run.id }]);
    workers = workers.filter((w) => w !== victim);
  }, 90_000);
});
