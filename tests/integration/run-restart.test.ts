import type { RunView } from '@cairn/schema';
import { afterAll, describe, expect, it } from 'vitest';
import { startBuiltServer, type BuiltServer } from '../support/built-server';
import { api, FAST_QUEUE_ENV, insertMemberWithKey, sql, waitForRun } from './run-processes';

// The built server (`node apps/server/dist/main.js`) with one run worker, stopped with SIGTERM while a
// run is being computed and three wait: nothing is failed or lost, and a new start finishes each once.
let server: BuiltServer | undefined;
afterAll(async () => {
  await server?.stop();
});

const env = { CAIRN_RUN_CONCURRENCY: '1', ...FAST_QUEUE_ENV };

describe('restarting the server mid-run', () => {
  it('gives the running run back on SIGTERM and finishes every run exactly once after the restart', async () => {
    const key = await insertMemberWithKey('restart-owner', 'researcher');
    server = await startBuiltServer(env);
    const submit = async (body: unknown) => (await api<RunView>(server!.url, 'POST', '/api/v1/runs', key, body)).body;
    const long = await submit({ spec: 'grid:13x13', method: 'exact', timeLimitSeconds: 3 });
    await waitForRun(server.url, long.id, key, (r) => r.status === 'running');
    const waiting = [await submit({ spec: 'path:25' }), await submit({ spec: 'cycle:14' }), await submit({ spec: 'star:23' })];
    const ids = [long.id, ...waiting.map((r) => r.id)];

    expect(await server.stop()).toBe(0);
    server = undefined;
    const stopped = await sql<{ status: string; attempts: number }>(`SELECT status, attempts FROM runs WHERE id = ANY($1::uuid[]) ORDER BY created_at`, [ids]);
    expect(stopped).toEqual([
      { status: 'queued', attempts: 1 },
      { status: 'queued', attempts: 0 },
      { status: 'queued', attempts: 0 },
      { status: 'queued', attempts: 0 },
    ]);

    server = await startBuiltServer(env);
    const finished = await Promise.all(ids.map((id) => waitForRun(server!.url, id, key)));
    expect(finished.map((r) => r.status)).toEqual(['done', 'done', 'done', 'done']);
    const rows = await sql<{ attempts: number }>(`SELECT attempts FROM runs WHERE id = ANY($1::uuid[]) ORDER BY created_at`, [ids]);
    expect(rows.map((r) => r.attempts)).toEqual([2, 1, 1, 1]);
    const [{ n }] = (await sql<{ n: number }>(`SELECT count(*)::int AS n FROM runs WHERE owner_id = (SELECT owner_id FROM runs WHERE id = $1)`, [long.id])) as [{ n: number }];
    expect(n).toBe(4);
    // One job per start: two for the run that was interrupted, one for each of the others; none left over.
    const jobs = await sql<{ run: string; state: string; n: number }>(
      `SELECT data->>'runId' AS run, state::text AS state, count(*)::int AS n FROM pgboss.job WHERE data->>'runId' = ANY($1) GROUP BY 1, 2`,
      [ids],
    );
    expect(jobs.every((j) => j.state === 'completed')).toBe(true);
    expect(Object.fromEntries(jobs.map((j) => [j.run, j.n]))).toEqual(Object.fromEntries(ids.map((id, i) => [id, i === 0 ? 2 : 1])));
    // Each graph was written to the atlas once, by its run
    // (no other test file runs these graphs: the files share one database).
    const atlas = await sql<{ graph_key: string; upper_run_id: string }>(`SELECT graph_key, upper_run_id FROM atlas_entries WHERE upper_run_id = ANY($1::uuid[]) ORDER BY graph_key`, [ids]);
    expect(atlas.map((a) => a.graph_key)).toEqual(['cycle:14', 'grid:13x13', 'path:25', 'star:23']);
  }, 120_000);
});
