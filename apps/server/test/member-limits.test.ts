import type { RunView, SweepView } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { api, startRunsHarness, type RunsHarness } from './runs-harness';
import { insertMemberWithKey } from './support/test-key';

// Per-member limits by role: runs queued or running at once (counted in PostgreSQL under a per-member
// lock), sweeps in progress, and the largest graph. No run workers here: every accepted run stays queued,
// so the counts only move when a test cancels a run.
vi.setConfig({ testTimeout: 60_000, hookTimeout: 60_000 });

const RESEARCHER_RUNS = 4;
const ADMIN_RUNS = 6;

let h: RunsHarness;

beforeAll(async () => {
  h = await startRunsHarness('member_limits', {
    env: {
      CAIRN_MAX_ACTIVE_RUNS_RESEARCHER: String(RESEARCHER_RUNS),
      CAIRN_MAX_ACTIVE_RUNS_ADMIN: String(ADMIN_RUNS),
      CAIRN_MAX_ACTIVE_SWEEPS_RESEARCHER: '1',
      CAIRN_MAX_RUN_VERTICES_RESEARCHER: '1000',
      CAIRN_MAX_RUN_EDGES_RESEARCHER: '1900',
    },
  });
});
afterAll(() => h?.close());

interface ErrorBody {
  error: { code: string; message: string; details?: Record<string, unknown> };
}

const count = async (sql: string, params: unknown[]) => ((await h.source.query(sql, params)) as { n: number }[])[0]!.n;
const activeRunsOf = (userId: string) => count(`SELECT count(*)::int AS n FROM runs WHERE owner_id = $1 AND status IN ('queued', 'running')`, [userId]);
const runsOf = (userId: string) => count(`SELECT count(*)::int AS n FROM runs WHERE owner_id = $1`, [userId]);
const jobsOf = (userId: string) =>
  count(`SELECT count(*)::int AS n FROM pgboss.job WHERE data->>'runId' IN (SELECT id::text FROM runs WHERE owner_id = $1)`, [userId]);

describe('runs queued or running at once', () => {
  it(`accepts exactly the limit of ${RESEARCHER_RUNS} out of ${RESEARCHER_RUNS + 5} simultaneous submissions, and stores nothing for the others`, async () => {
    const member = await insertMemberWithKey(h.source, 'racing-researcher', 'researcher');
    const answers = await Promise.all(
      Array.from({ length: RESEARCHER_RUNS + 5 }, (_, i) => api<RunView & ErrorBody>(h, 'POST', '/api/v1/runs', member.authorization, { spec: `cycle:${101 + i}` })),
    );
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses).toEqual([...Array<number>(RESEARCHER_RUNS).fill(202), ...Array<number>(5).fill(429)]);
    for (const refused of answers.filter((a) => a.status === 429)) {
      expect(refused.body.error.code).toBe('too_many_active_runs');
      expect(refused.body.error.message).toBe(`you have ${RESEARCHER_RUNS} runs queued or running; a researcher may have at most ${RESEARCHER_RUNS} at once: wait for one to finish, or cancel one`);
      expect(refused.body.error.details).toEqual({ limit: RESEARCHER_RUNS, active: RESEARCHER_RUNS, role: 'researcher' });
    }
    // Nothing of the refused ones: no run row, no queue job.
    expect(await runsOf(member.userId)).toBe(RESEARCHER_RUNS);
    expect(await jobsOf(member.userId)).toBe(RESEARCHER_RUNS);
  });

  it('refuses the next run at the limit, answers an identical request with the run it has, and takes a new one after a cancel', async () => {
    const member = await insertMemberWithKey(h.source, 'steady-researcher', 'researcher');
    const ids: string[] = [];
    for (let i = 0; i < RESEARCHER_RUNS; i++) {
      const res = await api<RunView>(h, 'POST', '/api/v1/runs', member.authorization, { spec: `path:${201 + i}` });
      expect(res.status).toBe(202);
      ids.push(res.body.id);
    }
    const over = await api<ErrorBody>(h, 'POST', '/api/v1/runs', member.authorization, { spec: 'path:299' });
    expect(over.status).toBe(429);
    expect(over.body.error.code).toBe('too_many_active_runs');
    // The same request again is no new run: it gets its queued run back, limit or not.
    const same = await api<RunView>(h, 'POST', '/api/v1/runs', member.authorization, { spec: 'path:201' });
    expect([same.status, same.body.id]).toEqual([200, ids[0]]);
    expect(await runsOf(member.userId)).toBe(RESEARCHER_RUNS);

    expect((await api(h, 'POST', `/api/v1/runs/${ids[1]}/cancel`, member.authorization)).status).toBe(202);
    expect(await activeRunsOf(member.userId)).toBe(RESEARCHER_RUNS - 1);
    const again = await api<RunView>(h, 'POST', '/api/v1/runs', member.authorization, { spec: 'path:299' });
    expect(again.status).toBe(202);
    expect((await api(h, 'POST', '/api/v1/runs', member.authorization, { spec: 'path:298' })).status).toBe(429);
  });

  it('counts each member on their own, and gives an admin the admin limit', async () => {
    const admin = await insertMemberWithKey(h.source, 'busy-admin', 'admin');
    const answers = await Promise.all(
      Array.from({ length: ADMIN_RUNS + 5 }, (_, i) => api<RunView & ErrorBody>(h, 'POST', '/api/v1/runs', admin.authorization, { spec: `star:${301 + i}` })),
    );
    expect(answers.filter((a) => a.status === 202)).toHaveLength(ADMIN_RUNS);
    expect(answers.filter((a) => a.status === 429).map((a) => a.body.error.details)).toEqual(Array(5).fill({ limit: ADMIN_RUNS, active: ADMIN_RUNS, role: 'admin' }));
    // The researchers above are at their limit; a new member is not.
    const fresh = await insertMemberWithKey(h.source, 'fresh-researcher', 'researcher');
    expect((await api(h, 'POST', '/api/v1/runs', fresh.authorization, { spec: 'star:399' })).status).toBe(202);
  });

  it('lets a sweep through at the run limit (its runs count as a sweep), but only so many sweeps at once', async () => {
    const member = await insertMemberWithKey(h.source, 'sweeping-researcher', 'researcher');
    for (let i = 0; i < RESEARCHER_RUNS; i++) expect((await api(h, 'POST', '/api/v1/runs', member.authorization, { spec: `complete:${11 + i}` })).status).toBe(202);
    const sweep = { family: 'grid', rows: { from: 2, to: 3 }, cols: { from: 5, to: 7 } };
    const first = await api<SweepView>(h, 'POST', '/api/v1/sweeps', member.authorization, sweep);
    expect(first.status).toBe(201);
    const sweepRuns = first.body.sweep.runCount;
    const second = await api<ErrorBody>(h, 'POST', '/api/v1/sweeps', member.authorization, { ...sweep, name: 'again' });
    expect(second.status).toBe(429);
    expect(second.body.error).toMatchObject({ code: 'too_many_active_sweeps', details: { limit: 1, active: 1, role: 'researcher' } });
    expect(await count(`SELECT count(*)::int AS n FROM sweeps WHERE owner_id = $1`, [member.userId])).toBe(1);
    expect(await runsOf(member.userId)).toBe(RESEARCHER_RUNS + sweepRuns);
    // Once its runs are over (cancelled here), the sweep no longer counts.
    await h.source.query(`UPDATE runs SET status = 'cancelled', finished_at = now() WHERE sweep_id = $1`, [first.body.sweep.id]);
    expect((await api(h, 'POST', '/api/v1/sweeps', member.authorization, { ...sweep, name: 'after' })).status).toBe(201);
  });
});

describe('the largest graph by role', () => {
  it('refuses a researcher a graph over the researcher limit (vertices or edges) with 413, and takes the same graph from an admin', async () => {
    const researcher = await insertMemberWithKey(h.source, 'modest-researcher', 'researcher');
    const admin = await insertMemberWithKey(h.source, 'roomy-admin', 'admin');
    // grid:30x34 has 1020 vertices; complete:62 has 62 vertices and 1891 edges, complete:63 1953 edges.
    const tooMany = await api<ErrorBody>(h, 'POST', '/api/v1/runs', researcher.authorization, { spec: 'grid:30x34' });
    expect(tooMany.status).toBe(413);
    expect(tooMany.body.error.code).toBe('graph_too_large');
    expect(tooMany.body.error.message).toBe('body.spec: grid:30x34 has 1020 vertices; a researcher may run graphs of at most 1000 vertices and 1900 edges (use the cairn CLI for larger ones)');
    const tooDense = await api<ErrorBody>(h, 'POST', '/api/v1/runs', researcher.authorization, { spec: 'complete:63' });
    expect([tooDense.status, tooDense.body.error.message]).toEqual([413, 'body.spec: complete:63 has 1953 edges; a researcher may run graphs of at most 1000 vertices and 1900 edges (use the cairn CLI for larger ones)']);
    expect((await api(h, 'POST', '/api/v1/runs', researcher.authorization, { spec: 'complete:62' })).status).toBe(202);
    expect(await runsOf(researcher.userId)).toBe(1);

    for (const spec of ['grid:30x34', 'complete:63']) expect((await api(h, 'POST', '/api/v1/runs', admin.authorization, { spec })).status, spec).toBe(202);

    // A sweep whose largest cell is over the researcher's limit: 413 for the researcher, accepted for the admin.
    const sweep = { family: 'torus', rows: { from: 30, to: 30 }, cols: { from: 33, to: 34 } };
    const refused = await api<ErrorBody>(h, 'POST', '/api/v1/sweeps', researcher.authorization, sweep);
    expect(refused.status).toBe(413);
    expect(refused.body.error.message).toBe('body.cols.to: the largest cell, 30 x 34, has 1020 vertices; a researcher may run graphs of at most 1000 vertices and 1900 edges');
    expect((await api(h, 'POST', '/api/v1/sweeps', admin.authorization, sweep)).status).toBe(201);
  });

  it('applies to an upload run by its graph size', async () => {
    const researcher = await insertMemberWithKey(h.source, 'uploading-researcher', 'researcher');
    // A path of 1001 vertices as an edge list: over the researcher's 1000 vertices.
    const edges = Array.from({ length: 1000 }, (_, i) => `${i} ${i + 1}`).join('\n');
    const form = new FormData();
    form.append('file', new Blob([edges], { type: 'text/plain' }), 'long-path.edges');
    const uploaded = await fetch(`${h.base}/api/v1/graphs`, { method: 'POST', headers: { authorization: researcher.authorization }, body: form });
    expect(uploaded.status).toBe(201);
    const { graph } = (await uploaded.json()) as { graph: { id: string; vertexCount: number } };
    expect(graph.vertexCount).toBe(1001);
    const run = await api<ErrorBody>(h, 'POST', '/api/v1/runs', researcher.authorization, { graphId: graph.id });
    expect(run.status).toBe(413);
    expect(run.body.error.message).toBe('body.spec: the upload long-path.edges has 1001 vertices; a researcher may run graphs of at most 1000 vertices and 1900 edges (use the cairn CLI for larger ones)');
  });
});
