// Reliability, part 1: faults. Against the built server (`node apps/server/dist/main.js`) and real
// PostgreSQL: the server killed with SIGKILL mid-run, a run reaching its memory limit, PostgreSQL stopped
// for a few seconds (on a private cluster of this file's own), and a search cancelled midway. Each test
// records its figures in bench/results/reliability.json.
import type { RunView } from '@cairn/schema';
import { graphFromSpec, verifyRanking } from '@cairn/engine';
import { createDataSource, createLogger, Database, loadDemoData } from '@cairn/server';
import pg from 'pg';
import { afterAll, describe, expect, it } from 'vitest';
import { startBuiltServer, type BuiltServer } from '../support/built-server';
import { recordReliability } from '../support/reliability-results';
import { createDatabase, startPrivateCluster, type PrivateCluster } from '../support/reliability-postgres';
import { api, FAST_QUEUE_ENV, insertMemberWithKey, sql, waitForRun } from '../integration/run-processes';

const env = { CAIRN_RUN_CONCURRENCY: '1', ...FAST_QUEUE_ENV };
const seconds = (ms: number) => Math.round(ms / 100) / 10;
const OUTAGE_MS = 4_000;
const PROBE_TIMEOUT_MS = 5_000;

interface Probe {
  what: 'health' | 'read';
  status: number | 'timeout' | 'network';
  ms: number;
  body: unknown;
}
/** What the server answered while PostgreSQL was stopped (the outage test fills it). */
const outageProbes: Probe[] = [];

let server: BuiltServer | undefined;
let privateServer: BuiltServer | undefined;
let cluster: PrivateCluster | undefined;
afterAll(async () => {
  await server?.stop();
  await privateServer?.stop();
  await cluster?.destroy();
}, 60_000);

async function submit(base: string, key: string, body: unknown): Promise<RunView> {
  const res = await api<RunView>(base, 'POST', '/api/v1/runs', key, body);
  expect(res.status).toBe(202);
  return res.body;
}

describe('faults', () => {
  it('finishes every run exactly once after the server is killed with SIGKILL mid-run', async () => {
    const key = await insertMemberWithKey('faults-sigkill', 'researcher');
    server = await startBuiltServer(env);
    const long = await submit(server.url, key, { spec: 'grid:13x15', method: 'exact', timeLimitSeconds: 4 });
    await waitForRun(server.url, long.id, key, (r) => r.status === 'running');
    const waiting = [];
    for (const spec of ['path:31', 'cycle:19', 'staircase:5']) waiting.push(await submit(server.url, key, { spec }));
    const ids = [long.id, ...waiting.map((r) => r.id)];

    server.child.kill('SIGKILL');
    await server.stop(); // resolves on exit
    server = undefined;
    const killedAt = Date.now();
    // Nothing had the chance to give the running run back: it is still marked running, the rest queued.
    const killed = await sql<{ status: string; attempts: number }>(`SELECT status, attempts FROM runs WHERE id = ANY($1::uuid[]) ORDER BY created_at`, [ids]);
    expect(killed).toEqual([
      { status: 'running', attempts: 1 },
      { status: 'queued', attempts: 0 },
      { status: 'queued', attempts: 0 },
      { status: 'queued', attempts: 0 },
    ]);

    server = await startBuiltServer(env);
    const restartedAt = Date.now();
    const finished = await Promise.all(ids.map((id) => waitForRun(server!.url, id, key, undefined, 60_000)));
    const allDoneAt = Date.now();
    expect(finished.map((r) => r.status)).toEqual(['done', 'done', 'done', 'done']);
    for (const r of finished) expect(r.result!.verified).toBe(true);
    const rows = await sql<{ attempts: number }>(`SELECT attempts FROM runs WHERE id = ANY($1::uuid[]) ORDER BY created_at`, [ids]);
    expect(rows.map((r) => r.attempts)).toEqual([2, 1, 1, 1]);
    // None lost, none made twice: the owner has exactly the four runs submitted.
    const [{ n }] = (await sql<{ n: number }>(`SELECT count(*)::int AS n FROM runs WHERE owner_id = (SELECT owner_id FROM runs WHERE id = $1)`, [long.id])) as [{ n: number }];
    expect(n).toBe(4);
    // The queue: every job of these runs completed, none left waiting or active; the quick runs had one
    // job each, handed out once. The killed run's job was handed out once per attempt (pg-boss retries an
    // expired job in the same row, or recovery queues a new one: either way, starts = attempts).
    const jobs = await sql<{ run: string; state: string; retries: number }>(
      `SELECT data->>'runId' AS run, state::text AS state, retry_count AS retries FROM pgboss.job WHERE data->>'runId' = ANY($1)`,
      [ids],
    );
    const jobsOf = (id: string) => jobs.filter((j) => j.run === id);
    for (const id of ids.slice(1)) expect(jobsOf(id)).toEqual([{ run: id, state: 'completed', retries: 0 }]);
    const longJobs = jobsOf(long.id);
    expect(longJobs.filter((j) => j.state === 'completed')).toHaveLength(1);
    expect(longJobs.every((j) => ['completed', 'failed', 'cancelled'].includes(j.state))).toBe(true);
    expect(longJobs.length + longJobs.reduce((s, j) => s + j.retries, 0)).toBe(2);
    // One atlas write per graph, by its run (no other test file runs these four graphs).
    const atlas = await sql<{ graph_key: string; upper_run_id: string }>(`SELECT graph_key, upper_run_id FROM atlas_entries WHERE upper_run_id = ANY($1::uuid[]) ORDER BY graph_key`, [ids]);
    expect(atlas.map((a) => a.graph_key)).toEqual(['cycle:19', 'grid:13x15', 'path:31', 'staircase:5']);
    expect(new Set(atlas.map((a) => a.upper_run_id))).toEqual(new Set(ids));

    recordReliability('sigkillMidRun', {
      runsSubmitted: ids.length,
      runsFinished: finished.filter((r) => r.status === 'done').length,
      runsLost: ids.length - finished.length,
      runsDuplicated: n - ids.length,
      attempts: rows.map((r) => r.attempts),
      jobsOfKilledRun: longJobs.map((j) => ({ state: j.state, retries: j.retries })),
      secondsKilledToRestarted: seconds(restartedAt - killedAt),
      secondsRestartToAllDone: seconds(allDoneAt - restartedAt),
    });
  }, 90_000);

  // CAIRN_ENGINE_MEMORY_MB bounds each engine worker: its heap (piscina resourceLimits; a thread beyond it
  // is ended and its task fails with out_of_memory, see the pool's own tests) and the exact search's
  // tables, which live outside the heap: a large search stops at that budget and keeps its proven
  // interval and ranking, while the other runs finish and the server's own thread is untouched.
  it('ends a run whose search reaches the engine memory limit with its proven interval; the others finish, the server stays up', async () => {
    const key = await insertMemberWithKey('faults-memory', 'researcher');
    // Only the memory-limited server may take this run: the queue is shared, so the first test's server
    // (no limit) would otherwise race it for the job and run the search to its time limit.
    await server?.stop();
    server = undefined;
    const heapMb = 64;
    // A random graph: its vertex branching fills the search's tables fast (grids branch over separators).
    const bigSpec = 'gnp:50:0.06:1';
    const oomServer = await startBuiltServer({ ...env, CAIRN_RUN_CONCURRENCY: '2', CAIRN_ENGINE_THREADS: '2', CAIRN_ENGINE_MEMORY_MB: String(heapMb) });
    try {
      const t0 = Date.now();
      const big = await submit(oomServer.url, key, { spec: bigSpec, method: 'exact', timeLimitSeconds: 60 });
      const quick = [];
      for (const spec of ['path:33', 'cycle:21', 'complete:6']) quick.push(await submit(oomServer.url, key, { spec }));
      const failed = await waitForRun(oomServer.url, big.id, key, undefined, 70_000);
      const failedAt = Date.now();
      expect(failed.status).toBe('done');
      expect(failed.error).toBeNull();
      expect(failed.attempts).toBe(1);
      const stopped = failed.result!;
      expect(stopped.stats.stopReason).toBe('memory-limit');
      expect(stopped.rankNumber).toBeNull();
      expect(stopped.lower).toBeLessThan(stopped.upper);
      // The certificate is re-checked here by the engine's verifier, not only by the server's word.
      const g = graphFromSpec(bigSpec);
      expect(verifyRanking(g, stopped.labels)).toMatchObject({ valid: true, maxLabel: stopped.upper });
      // The worker thread is free again: a run submitted afterwards is computed too.
      const after = await submit(oomServer.url, key, { spec: 'path:34' });
      const others = await Promise.all([...quick, after].map((r) => waitForRun(oomServer.url, r.id, key)));
      expect(others.map((r) => r.status)).toEqual(['done', 'done', 'done', 'done']);
      for (const r of others) expect(r.result!.verified).toBe(true);
      expect(oomServer.child.exitCode).toBeNull();
      expect(oomServer.child.signalCode).toBeNull();
      const health = await fetch(`${oomServer.url}/api/health`, { signal: AbortSignal.timeout(5_000) });
      expect(health.status).toBe(200);
      // Settled for good: not handed out again.
      await new Promise((r) => setTimeout(r, 1_500));
      const [row] = await sql<{ status: string; attempts: number }>(`SELECT status, attempts FROM runs WHERE id = $1`, [big.id]);
      expect(row).toEqual({ status: 'done', attempts: 1 });
      recordReliability('memoryLimitRun', {
        how: `CAIRN_ENGINE_MEMORY_MB=${heapMb} on the built server`,
        spec: `${bigSpec} exact, time limit 60 s`,
        stopReason: stopped.stats.stopReason,
        interval: [stopped.lower, stopped.upper],
        memoSize: stopped.stats.memoSize,
        secondsToStop: seconds(failedAt - t0),
        otherRunsSubmitted: others.length,
        otherRunsFinished: others.filter((r) => r.status === 'done').length,
        serverStayedUp: oomServer.child.exitCode === null,
        healthAfter: health.status,
      });
    } finally {
      await oomServer.stop();
    }
  }, 90_000);

  it('answers promptly with JSON errors while PostgreSQL is stopped (health 503), and recovers by itself', async () => {
    const startedAt = Date.now();
    cluster = await startPrivateCluster();
    const dbName = 'cairn_faults_private';
    await createDatabase(cluster, dbName);
    const database = new Database(createDataSource(cluster.url(dbName)), createLogger('silent'));
    await database.runMigrations();
    const key = `Bearer ${(await loadDemoData(await database.connect())).apiKey}`;
    await database.close();
    const clusterReadyMs = Date.now() - startedAt;
    privateServer = await startBuiltServer({ ...env, CAIRN_DB_PORT: String(cluster.port), CAIRN_DB_NAME: dbName });
    const base = privateServer.url;

    const probe = async (what: Probe['what']): Promise<Probe> => {
      const t0 = Date.now();
      try {
        const res = await fetch(`${base}${what === 'health' ? '/api/health' : '/api/v1/runs?limit=5'}`, {
          headers: what === 'read' ? { authorization: key } : {},
          signal: AbortSignal.timeout(PROBE_TIMEOUT_MS),
        });
        const text = await res.text();
        let body: unknown = text;
        try {
          body = JSON.parse(text);
        } catch {
          // kept as text: the checks below then fail on its shape
        }
        return { what, status: res.status, ms: Date.now() - t0, body };
      } catch (err) {
        return { what, status: (err as Error).name === 'TimeoutError' ? 'timeout' : 'network', ms: Date.now() - t0, body: String(err) };
      }
    };
    expect((await probe('health')).status).toBe(200);
    expect((await probe('read')).status).toBe(200);
    const before = await submit(base, key, { spec: 'path:12' });
    expect((await waitForRun(base, before.id, key)).status).toBe('done');

    // The outage: a few seconds of probing both endpoints with PostgreSQL stopped.
    await cluster.stop();
    const outageEnd = Date.now() + OUTAGE_MS;
    while (Date.now() < outageEnd) {
      outageProbes.push(await probe('health'), await probe('read'));
      await new Promise((r) => setTimeout(r, 250));
    }
    const restartAskedAt = Date.now();
    await cluster.start(); // pg_ctl -w: returns once PostgreSQL accepts connections
    const restartedAt = Date.now();
    // Recovery: both answer 200 again without touching the server.
    const after: Probe[] = [];
    let healthOkAt: number | undefined;
    let readOkAt: number | undefined;
    while ((healthOkAt === undefined || readOkAt === undefined) && Date.now() - restartedAt < 30_000) {
      const [h, r] = [await probe('health'), await probe('read')];
      after.push(h, r);
      if (h.status === 200) healthOkAt ??= Date.now();
      if (r.status === 200) readOkAt ??= Date.now();
      if (healthOkAt === undefined || readOkAt === undefined) await new Promise((res) => setTimeout(res, 200));
    }
    const recoveredAt = Date.now();
    // And the run queue recovered too: a run submitted now is computed, once.
    const late = await submit(base, key, { spec: 'path:13' });
    const lateDone = await waitForRun(base, late.id, key, undefined, 30_000);
    const lateDoneAt = Date.now();

    const of = (what: Probe['what']) => outageProbes.filter((p) => p.what === what);
    const statuses = (ps: Probe[]) => Object.fromEntries([...new Set(ps.map((p) => String(p.status)))].map((s) => [s, ps.filter((p) => String(p.status) === s).length]));
    recordReliability('postgresOutage', {
      outageSeconds: OUTAGE_MS / 1000,
      requestsDuringOutage: outageProbes.length,
      answers503: outageProbes.filter((p) => p.status === 503).length,
      answers500: outageProbes.filter((p) => p.status === 500).length,
      healthAnswersDuringOutage: statuses(of('health')),
      apiReadAnswersDuringOutage: statuses(of('read')),
      apiReadBodyDuringOutage: of('read')[0]?.body,
      timeouts: outageProbes.filter((p) => p.status === 'timeout').length,
      slowestAnswerMs: Math.max(...outageProbes.map((p) => p.ms)),
      answersNot200AfterRestart: after.filter((p) => p.status !== 200).length,
      secondsPgCtlStart: seconds(restartedAt - restartAskedAt),
      secondsToHealth200AfterPgUp: healthOkAt && seconds(healthOkAt - restartedAt),
      secondsToRead200AfterPgUp: readOkAt && seconds(readOkAt - restartedAt),
      secondsToRecoverFromRestartCommand: seconds(recoveredAt - restartAskedAt),
      secondsToRunDoneAfterRecovery: seconds(lateDoneAt - recoveredAt),
      secondsPrivateClusterSetup: seconds(clusterReadyMs),
    });

    // Never a hang: every request is answered, each within a few seconds, in JSON.
    for (const p of outageProbes) {
      expect(typeof p.status, `${p.what} during the outage: ${JSON.stringify(p.body)}`).toBe('number');
      expect(p.ms).toBeLessThan(PROBE_TIMEOUT_MS);
    }
    for (const p of of('health')) {
      expect(p.status).toBe(503);
      expect(p.body).toMatchObject({ status: 'degraded', db: 'down', reason: expect.stringMatching(/^database unreachable/) });
    }
    // The reads are refused as "database unavailable", in the JSON error shape, never as an internal error.
    for (const p of of('read')) {
      expect(p.status, JSON.stringify(p.body)).toBe(503);
      expect(p.body).toMatchObject({ error: { code: 'database_unavailable', message: expect.any(String) } });
    }
    expect(after.every((p) => p.status === 503 || p.status === 200)).toBe(true);
    expect(healthOkAt).toBeDefined();
    expect(readOkAt).toBeDefined();
    expect(privateServer.child.exitCode).toBeNull();
    expect(lateDone.status).toBe('done');
    expect(lateDone.attempts).toBe(1);
  }, 90_000);

  it('keeps the best bounds so far, with a verifiable certificate, when a search is cancelled', async () => {
    const key = await insertMemberWithKey('faults-cancel', 'researcher');
    server ??= await startBuiltServer(env);
    const spec = 'grid:13x16';
    const run = await submit(server.url, key, { spec, method: 'exact', timeLimitSeconds: 60 });
    const running = await waitForRun(server.url, run.id, key, (r) => r.status === 'running' && r.progress !== null && r.progress.nodes > 0, 30_000);
    const cancelAskedAt = Date.now();
    const cancel = await api<RunView>(server.url, 'POST', `/api/v1/runs/${run.id}/cancel`, key);
    expect(cancel.status).toBeLessThan(300);
    const done = await waitForRun(server.url, run.id, key, undefined, 20_000);
    const stoppedAt = Date.now();
    expect(done.status).toBe('cancelled');
    expect(done.lower).not.toBeNull();
    expect(done.upper).not.toBeNull();
    expect(done.lower!).toBeLessThanOrEqual(done.upper!);
    // At least as good as what the search had reported before the cancel.
    expect(done.upper!).toBeLessThanOrEqual(running.progress!.upper);
    expect(done.lower!).toBeGreaterThanOrEqual(running.progress!.lower);
    expect(done.result).not.toBeNull();
    expect(done.result!.lower).toBe(done.lower);
    expect(done.result!.upper).toBe(done.upper);
    const verdict = verifyRanking(graphFromSpec(spec), done.result!.labels);
    expect(verdict.valid).toBe(true);
    expect(verdict.maxLabel).toBeLessThanOrEqual(done.upper!);
    recordReliability('cancelMidSearch', {
      spec,
      lower: done.lower,
      upper: done.upper,
      progressAtCancel: running.progress,
      stopReason: done.result!.stats.stopReason,
      certificateValid: verdict.valid,
      certificateMaxLabel: verdict.maxLabel,
      secondsCancelToStopped: seconds(stoppedAt - cancelAskedAt),
    });
  }, 60_000);
});
