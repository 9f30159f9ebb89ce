import type { RunView } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { claimRun } from '../src/jobs/run-claim';
import { api, FAST_QUEUE, startRunsHarness, waitForRun, type RunsHarness } from './runs-harness';
import { insertMemberWithKey } from './support/test-key';

// The queue across restarts: closing the run workers mid-run gives the run back (not failed), a new
// start finishes every run exactly once, and runs stranded without a job are found and re-queued.
vi.setConfig({ testTimeout: 90_000, hookTimeout: 60_000 });

let h: RunsHarness;
let owner: string;

beforeAll(async () => {
  h = await startRunsHarness('jobs_restart', { workers: true });
  owner = (await insertMemberWithKey(h.source, 'owner-restart', 'researcher')).authorization;
});
afterAll(() => h?.close());

const submit = async (body: unknown) => (await api<RunView>(h, 'POST', '/api/v1/runs', owner, body)).body;

interface RunRow {
  id: string;
  status: string;
  attempts: number;
  worker: string | null;
}
const rowsOf = async (ids: string[]) =>
  (await h.source.query(`SELECT id, status, attempts, worker FROM runs WHERE id = ANY($1::uuid[]) ORDER BY created_at`, [ids])) as RunRow[];

/** The run's pg-boss jobs by state: e.g. { created: 1 } or { completed: 2 }. */
async function jobsOf(runId: string): Promise<Record<string, number>> {
  const rows = (await h.source.query(`SELECT state::text AS state, count(*)::int AS n FROM pgboss.job WHERE data->>'runId' = $1 GROUP BY state`, [runId])) as { state: string; n: number }[];
  return Object.fromEntries(rows.map((r) => [r.state, r.n]));
}

describe('closing and starting the run workers', () => {
  it('gives a running run back to the queue on close and finishes every run once after a new start', async () => {
    const long = await submit({ spec: 'grid:12x12', method: 'exact', timeLimitSeconds: 3 });
    await waitForRun(h, long.id, owner, (r) => r.status === 'running');
    const queued = [await submit({ spec: 'path:20' }), await submit({ spec: 'cycle:12' }), await submit({ spec: 'grid:3x3' })];
    const ids = [long.id, ...queued.map((r) => r.id)];

    await h.stopWorkers();
    const stopped = await rowsOf(ids);
    // Not failed: queued again, with nobody working on it, and one job waiting for each run.
    expect(stopped.map((r) => [r.status, r.attempts, r.worker])).toEqual([
      ['queued', 1, null],
      ['queued', 0, null],
      ['queued', 0, null],
      ['queued', 0, null],
    ]);
    for (const id of ids) {
      const jobs = await jobsOf(id);
      expect((jobs.created ?? 0) + (jobs.retry ?? 0), `${id} ${JSON.stringify(jobs)}`).toBe(1);
      expect(jobs.active ?? 0).toBe(0);
    }

    const jobs = await h.startWorkers();
    const finished = await Promise.all(ids.map((id) => waitForRun(h, id, owner)));
    expect(finished.map((r) => r.status)).toEqual(['done', 'done', 'done', 'done']);
    const after = await rowsOf(ids);
    expect(after.map((r) => r.attempts)).toEqual([2, 1, 1, 1]);
    expect(after.every((r) => r.worker === jobs.worker)).toBe(true);
    // Nothing lost, nothing doubled: the four runs, each job done once, one atlas entry per graph.
    const [{ n }] = (await h.source.query(`SELECT count(*)::int AS n FROM runs WHERE owner_id = (SELECT owner_id FROM runs WHERE id = $1)`, [long.id])) as [{ n: number }];
    expect(n).toBe(4);
    expect(await jobsOf(long.id)).toEqual({ completed: 2 });
    for (const r of queued) expect(await jobsOf(r.id)).toEqual({ completed: 1 });
    const atlas = (await h.source.query(`SELECT graph_key, upper_run_id FROM atlas_entries WHERE graph_key = ANY($1) ORDER BY graph_key`, [
      ['grid:12x12', 'path:20', 'cycle:12', 'grid:3x3'],
    ])) as { graph_key: string; upper_run_id: string }[];
    expect(atlas.map((a) => a.graph_key)).toEqual(['cycle:12', 'grid:12x12', 'grid:3x3', 'path:20']);
    expect(atlas.find((a) => a.graph_key === 'grid:12x12')!.upper_run_id).toBe(long.id);
  });

  it('re-queues at start-up a run left running by a worker that is gone, and fails one started too often', async () => {
    await h.stopWorkers();
    const stranded = await submit({ spec: 'star:9' });
    const worn = await submit({ spec: 'star:10' });
    // As a killed worker leaves them, with their jobs gone too (e.g. pg-boss gave up on them).
    await h.source.query(`UPDATE runs SET status = 'running', attempts = 1, worker = 'gone:1', heartbeat_at = now() - interval '1 hour' WHERE id = $1`, [stranded.id]);
    await h.source.query(`UPDATE runs SET status = 'running', attempts = 5, worker = 'gone:2', heartbeat_at = now() - interval '1 hour' WHERE id = $1`, [worn.id]);
    await h.source.query(`DELETE FROM pgboss.job WHERE data->>'runId' = ANY($1)`, [[stranded.id, worn.id]]);

    await h.startWorkers();
    const done = await waitForRun(h, stranded.id, owner);
    expect(done.status).toBe('done');
    // χr(K_{1,9}) = 2 (common practice: the centre above, every leaf one label).
    expect(done.rankNumber).toBe(2);
    expect((await rowsOf([stranded.id]))[0]!.attempts).toBe(2);
    const failed = await waitForRun(h, worn.id, owner);
    expect(failed).toMatchObject({ status: 'failed', error: { code: 'attempts_exhausted' } });
  });
});

describe('claiming a run', () => {
  it('takes a queued run, refuses one with a live heartbeat, and takes over one whose worker went quiet', async () => {
    await h.stopWorkers();
    const run = await submit({ spec: 'path:40' });
    const first = await claimRun(h.source, run.id, 'test:1', FAST_QUEUE.staleSeconds);
    expect(first).toMatchObject({ kind: 'claimed', run: { attempt: 1 } });
    // The first attempt is alive (its heartbeat was written just now): a second job must not take it.
    expect(await claimRun(h.source, run.id, 'test:2', FAST_QUEUE.staleSeconds)).toEqual({ kind: 'busy' });
    await h.source.query(`UPDATE runs SET heartbeat_at = now() - interval '1 minute' WHERE id = $1`, [run.id]);
    expect(await claimRun(h.source, run.id, 'test:2', FAST_QUEUE.staleSeconds)).toMatchObject({ kind: 'claimed', run: { attempt: 2 } });
    await h.source.query(`UPDATE runs SET status = 'done' WHERE id = $1`, [run.id]);
    expect(await claimRun(h.source, run.id, 'test:3', FAST_QUEUE.staleSeconds)).toEqual({ kind: 'nothing', status: 'done' });
    await h.source.query(`DELETE FROM runs WHERE id = $1`, [run.id]);
    expect(await claimRun(h.source, run.id, 'test:3', FAST_QUEUE.staleSeconds)).toEqual({ kind: 'nothing', status: null });
    await h.startWorkers();
  });
});
