import { cylinderGraph, gridGraph } from '@cairn/engine';
import { SweepList, SweepView } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { api, bruteTreeDepth, startRunsHarness, type RunsHarness } from './runs-harness';
import { insertMemberWithKey } from './support/test-key';

// Sweeps: a table of runs over ranges of sizes, fanned out in one transaction and computed by the workers.
vi.setConfig({ testTimeout: 90_000, hookTimeout: 60_000 });

let h: RunsHarness;
let owner: string;
let other: string;

beforeAll(async () => {
  h = await startRunsHarness('sweeps_table', { workers: true });
  owner = (await insertMemberWithKey(h.source, 'owner-sweep', 'researcher')).authorization;
  other = (await insertMemberWithKey(h.source, 'other-sweep', 'researcher')).authorization;
});
afterAll(() => h?.close());

async function waitForSweep(id: string, authorization = owner, timeoutMs = 60_000): Promise<SweepView> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const { body } = await api<SweepView>(h, 'GET', `/api/v1/sweeps/${id}`, authorization);
    const c = body.sweep.counts;
    if (c.queued + c.running === 0) return body;
    if (Date.now() > deadline) throw new Error(`sweep ${id} not finished: ${JSON.stringify(c)}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

describe('a sweep of grids', () => {
  let sweep: SweepView;

  beforeAll(async () => {
    const res = await api<SweepView>(h, 'POST', '/api/v1/sweeps', owner, { family: 'grid', rows: { from: 2, to: 3 }, cols: { from: 2, to: 4 }, timeLimitSeconds: 20 });
    expect(res.status).toBe(201);
    sweep = res.body;
  });

  it('fans out into one run per distinct grid: a transposed cell shares its mirror\'s run', async () => {
    expect(sweep.sweep).toMatchObject({ family: 'grid', name: 'grid 2..3 x 2..4', cellCount: 6, runCount: 5, mirrorCells: 'shared', method: 'auto', timeLimitSeconds: 20 });
    expect(sweep.cells.map((c) => `${c.rows}x${c.cols}`)).toEqual(['2x2', '2x3', '2x4', '3x2', '3x3', '3x4']);
    const mirror = sweep.cells.find((c) => c.rows === 3 && c.cols === 2)!;
    expect(mirror.mirrorOf).toEqual({ rows: 2, cols: 3 });
    expect(mirror.runId).toBe(sweep.cells.find((c) => c.rows === 2 && c.cols === 3)!.runId);
    const [{ n }] = (await h.source.query(`SELECT count(*)::int AS n FROM runs WHERE sweep_id = $1`, [sweep.sweep.id])) as [{ n: number }];
    expect(n).toBe(5);
  });

  it('finishes, and its table holds the rank number of every cell', async () => {
    const done = await waitForSweep(sweep.sweep.id);
    expect(SweepView.safeParse(done).error).toBeUndefined();
    expect(done.sweep.counts).toEqual({ queued: 0, running: 0, done: 5, failed: 0, cancelled: 0 });
    for (const c of done.cells) {
      // Each value against the defining recursion, computed here (grids of at most 12 vertices).
      expect(c.rankNumber, `${c.rows}x${c.cols}`).toBe(bruteTreeDepth(c.rows * c.cols, gridGraph(c.rows, c.cols).edges()));
      expect(c).toMatchObject({ status: 'done', lower: c.rankNumber, upper: c.rankNumber });
      expect(c.provenance).not.toBeNull();
    }
  });

  it('gives each 2 x n cell its closed form for the chart, and the 3-row cells none', async () => {
    const done = await waitForSweep(sweep.sweep.id);
    // χr(P_2 × P_n) = ⌊log2(n + 1)⌋ + ⌊log2((n + 1)/3)⌋ + 2, with ⌊log2 x⌋ = −1 for x < 1 (Alpert, "Rank numbers of
    // grid graphs", Discrete Math. 2010; stated from memory in FORMULAS.md, checked by exhaustive search).
    const floorLog2 = (x: number) => (x < 1 ? -1 : Math.floor(Math.log2(x)));
    const twoRows = (n: number) => floorLog2(n + 1) + floorLog2((n + 1) / 3) + 2;
    for (const c of done.cells) {
      if (c.rows === 2 || c.cols === 2) {
        const n = c.rows === 2 ? c.cols : c.rows;
        expect(c.closedForm?.value, `${c.rows}x${c.cols}`).toBe(twoRows(n));
        expect(c.closedForm?.value).toBe(c.rankNumber);
      } else expect(c.closedForm, `${c.rows}x${c.cols}`).toBeNull();
    }
  });

  it('exports the table as CSV, one row per cell', async () => {
    const res = await fetch(`${h.base}/api/v1/sweeps/${sweep.sweep.id}/export?format=csv`, { headers: { authorization: owner } });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/^text\/csv/);
    expect(res.headers.get('content-disposition')).toMatch(/^attachment; filename="?cairn-sweep-grid-2-3x2-4-[0-9a-f]{8}\.csv"?$/);
    const lines = (await res.text()).trim().split('\n');
    expect(lines[0]).toBe('rows,cols,status,rank_number,lower,upper,provenance,run_id,mirror_of');
    expect(lines).toHaveLength(7);
    const done = await waitForSweep(sweep.sweep.id);
    for (const [i, c] of done.cells.entries()) {
      const f = lines[i + 1]!.split(',');
      expect(f.slice(0, 6)).toEqual([String(c.rows), String(c.cols), 'done', String(c.rankNumber), String(c.lower), String(c.upper)]);
      expect(f[7]).toBe(c.runId);
      expect(f[8]).toBe(c.mirrorOf ? `${c.mirrorOf.rows}x${c.mirrorOf.cols}` : '');
    }
  });

  it('is listed for its owner, hidden from others while private', async () => {
    const mine = await api<SweepList>(h, 'GET', '/api/v1/sweeps', owner);
    expect(SweepList.safeParse(mine.body).error).toBeUndefined();
    expect(mine.body.sweeps.map((s) => s.id)).toContain(sweep.sweep.id);
    const theirs = await api<SweepList>(h, 'GET', '/api/v1/sweeps', other);
    expect(theirs.body.sweeps.map((s) => s.id)).not.toContain(sweep.sweep.id);
    expect((await api(h, 'GET', `/api/v1/sweeps/${sweep.sweep.id}`, other)).status).toBe(404);
  });
});

describe('other sweeps', () => {
  it('keeps every cell of a cylinder sweep (no mirror: P_m x C_n is not P_n x C_m)', async () => {
    const res = await api<SweepView>(h, 'POST', '/api/v1/sweeps', owner, { name: 'thin cylinders', family: 'cylinder', rows: { from: 1, to: 2 }, cols: { from: 3, to: 4 }, visibility: 'public' });
    expect(res.status).toBe(201);
    expect(res.body.sweep).toMatchObject({ name: 'thin cylinders', cellCount: 4, runCount: 4, mirrorCells: 'none', visibility: 'public' });
    const done = await waitForSweep(res.body.sweep.id);
    for (const c of done.cells) {
      expect(c.mirrorOf).toBeNull();
      expect(c.rankNumber, `${c.rows}x${c.cols}`).toBe(bruteTreeDepth(c.rows * c.cols, cylinderGraph(c.rows, c.cols).edges()));
    }
    // Public: another member sees it and its runs.
    expect((await api(h, 'GET', `/api/v1/sweeps/${res.body.sweep.id}`, other)).status).toBe(200);
    expect((await api(h, 'GET', `/api/v1/runs/${done.cells[0]!.runId}`, other)).status).toBe(200);
  });

  it('refuses too many cells, sizes the family cannot have, and empty ranges, naming the field', async () => {
    const post = (body: unknown) => api<{ error: { code: string; message: string } }>(h, 'POST', '/api/v1/sweeps', owner, body);
    const big = await post({ family: 'grid', rows: { from: 1, to: 20 }, cols: { from: 1, to: 21 } });
    expect(big.status).toBe(400);
    expect(big.body.error.message).toBe('body.cols.to: the sweep has 420 cells; a sweep may have at most 400 (split it into several)');
    const torus = await post({ family: 'torus', rows: { from: 2, to: 4 }, cols: { from: 3, to: 4 } });
    expect(torus.body.error.message).toBe('body.rows.from: a torus needs at least 3 rows');
    const cylinder = await post({ family: 'cylinder', rows: { from: 2, to: 4 }, cols: { from: 2, to: 4 } });
    expect(cylinder.body.error.message).toMatch(/^body\.cols\.from: a cylinder needs at least 3 columns/);
    const backwards = await post({ family: 'grid', rows: { from: 4, to: 2 }, cols: { from: 2, to: 4 } });
    expect(backwards.body.error.message).toBe('body.rows.to: rows.from must not exceed rows.to');
    const family = await post({ family: 'staircase', rows: { from: 1, to: 2 }, cols: { from: 1, to: 2 } });
    expect(family.body.error.message).toMatch(/^body\.family: /);
    const [{ n }] = (await h.source.query(`SELECT count(*)::int AS n FROM sweeps`)) as [{ n: number }];
    expect(n).toBe(2);
  });
});
