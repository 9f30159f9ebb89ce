import { gridGraph, verifyRanking } from '@cairn/engine';
import type { RunView } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { api, startRunsHarness, waitForRun, type RunsHarness } from './runs-harness';
import { insertMemberWithKey } from './support/test-key';

// Cancelling: a queued run at once, a running one through the engine pool's stop signal (it keeps the
// best interval it reached). One run worker, so a long run keeps the next one queued.
vi.setConfig({ testTimeout: 60_000, hookTimeout: 60_000 });

let h: RunsHarness;
let owner: string;
let other: string;
let admin: string;

beforeAll(async () => {
  h = await startRunsHarness('runs_cancel', { workers: true });
  owner = (await insertMemberWithKey(h.source, 'owner-cancel', 'researcher')).authorization;
  other = (await insertMemberWithKey(h.source, 'other-cancel', 'researcher')).authorization;
  admin = (await insertMemberWithKey(h.source, 'admin-cancel', 'admin')).authorization;
});
afterAll(() => h?.close());

const submit = async (body: unknown) => (await api<RunView>(h, 'POST', '/api/v1/runs', owner, body)).body;

describe('cancelling runs', () => {
  it('cancels a queued run at once and stops a running one with a valid interval', async () => {
    // Exact search on the 12 x 12 grid does not finish in the time this test gives it (11 x 11 takes
    // about 100 s on the bench machine).
    const long = await submit({ spec: 'grid:12x12', method: 'exact', timeLimitSeconds: 600 });
    const running = await waitForRun(h, long.id, owner, (r) => r.status === 'running' && r.progress !== null);
    expect(running.status).toBe('running');
    const waiting = await submit({ spec: 'grid:4x4', method: 'exact', timeLimitSeconds: 600 });
    expect(waiting.status).toBe('queued');

    const queuedCancel = await api<RunView>(h, 'POST', `/api/v1/runs/${waiting.id}/cancel`, owner);
    expect(queuedCancel.status).toBe(202);
    expect(queuedCancel.body).toMatchObject({ status: 'cancelled', result: null, cancelRequested: true });
    expect(queuedCancel.body.finishedAt).not.toBeNull();

    expect((await api(h, 'POST', `/api/v1/runs/${long.id}/cancel`, other)).status).toBe(404);
    const asked = await api<RunView>(h, 'POST', `/api/v1/runs/${long.id}/cancel`, owner);
    expect(asked.status).toBe(202);
    expect(asked.body).toMatchObject({ status: 'running', cancelRequested: true });

    const cancelled = await waitForRun(h, long.id, owner);
    expect(cancelled.status).toBe('cancelled');
    const r = cancelled.result!;
    expect(r.stats.stopReason).toBe('aborted');
    expect(r.rankNumber).toBeNull();
    // A valid interval: the lower bound is at least the 12 x 12 grid's trivial one (it holds a path of 144
    // vertices, floor(log2 144) + 1 = 8; Bodlaender et al., SIAM J. Discrete Math. 1998) and the upper bound
    // is certified by a ranking with that many labels.
    expect(r.lower).toBeGreaterThanOrEqual(Math.floor(Math.log2(144)) + 1);
    expect(r.lower).toBeLessThan(r.upper);
    expect(verifyRanking(gridGraph(12, 12), r.labels)).toMatchObject({ valid: true, maxLabel: r.upper });
    expect(cancelled).toMatchObject({ lower: r.lower, upper: r.upper, rankNumber: null });

    // The queued run was never started.
    const [row] = (await h.source.query(`SELECT attempts, started_at FROM runs WHERE id = $1`, [waiting.id])) as { attempts: number; started_at: Date | null }[];
    expect(row).toEqual({ attempts: 0, started_at: null });
    // The cancelled interval still tightened the atlas: it is a proven interval.
    const [entry] = (await h.source.query(`SELECT lower, upper, upper_run_id FROM atlas_entries WHERE graph_key = 'grid:12x12'`)) as Record<string, unknown>[];
    expect(entry).toEqual({ lower: r.lower, upper: r.upper, upper_run_id: long.id });
  });

  it('says 409 for a finished run; an admin may cancel anyone\'s run', async () => {
    const quick = await waitForRun(h, (await submit({ spec: 'path:9' })).id, owner);
    const again = await api<{ error: { code: string } }>(h, 'POST', `/api/v1/runs/${quick.id}/cancel`, owner);
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('run_finished');

    const long = await submit({ spec: 'grid:12x12', method: 'exact', timeLimitSeconds: 601 });
    await waitForRun(h, long.id, owner, (r) => r.status === 'running');
    expect((await api(h, 'POST', `/api/v1/runs/${long.id}/cancel`, admin)).status).toBe(202);
    expect((await waitForRun(h, long.id, owner)).status).toBe('cancelled');
  });

  it('deletes a running run: the worker stops and stores nothing', async () => {
    const long = await submit({ spec: 'grid:12x12', method: 'exact', timeLimitSeconds: 602 });
    await waitForRun(h, long.id, owner, (r) => r.status === 'running');
    expect((await api(h, 'DELETE', `/api/v1/runs/${long.id}`, owner)).status).toBe(204);
    expect((await api(h, 'GET', `/api/v1/runs/${long.id}`, owner)).status).toBe(404);
    // The worker is free again: the next run finishes.
    const next = await waitForRun(h, (await submit({ spec: 'cycle:5' })).id, owner);
    // χr(C_5) = 1 + floor(log2 4) + 1 = 4 (Bodlaender et al., SIAM J. Discrete Math. 1998).
    expect(next.rankNumber).toBe(4);
    const [{ n }] = (await h.source.query(`SELECT count(*)::int AS n FROM runs WHERE id = $1`, [long.id])) as [{ n: number }];
    expect(n).toBe(0);
  });
});
