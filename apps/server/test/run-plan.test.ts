import { bestUpperBound, gridGraph } from '@cairn/engine';
import { RunPlan } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../src/index';
import { serveApp, type ServedApp } from './support/listen';
import { testContext } from './support/test-context';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { insertMemberWithKey } from './support/test-key';

let t: TestDatabase;
let served: ServedApp;
let base: string;
let owner: { userId: string; authorization: string };
let stranger: { authorization: string };
let runId: string;
const rows = 4;
const cols = 5;
const labels = Array.from(bestUpperBound(gridGraph(rows, cols)).best.labels);

beforeAll(async () => {
  t = await createTestDatabase('run_plan');
  const source = await t.db.connect();
  owner = await insertMemberWithKey(source, 'plan-owner', 'researcher');
  stranger = await insertMemberWithKey(source, 'plan-stranger', 'researcher');
  const [run] = (await source.query(
    `INSERT INTO runs (owner_id, spec, graph_key, family, method, request_hash, status, certificate, lower, upper, share_token, visibility)
     VALUES ($1, $2, 'grid:4x5', 'grid', 'bounds', 'h', 'done', $3, 1, $4, 'plan-share-token-0001', 'link') RETURNING id`,
    [owner.userId, JSON.stringify({ family: 'grid', rows, cols }), JSON.stringify(labels), Math.max(...labels)],
  )) as { id: string }[];
  runId = run!.id;
  served = await serveApp(createApp(testContext(t.db)));
  base = served.url;
});
afterAll(async () => {
  await served.close();
  await t.drop();
});

// Grid adjacency, row-major numbering (as the engine numbers grids).
const adjacent = (u: number, v: number) => {
  const [ru, cu, rv, cv] = [Math.floor(u / cols), u % cols, Math.floor(v / cols), v % cols];
  return Math.abs(ru - rv) + Math.abs(cu - cv) === 1;
};

describe('GET /api/v1/runs/:id/plan', () => {
  it("reads the certificate as a schedule that obeys the definitions (common practice)", async () => {
    const res = await fetch(`${base}/api/v1/runs/${runId}/plan`, { headers: { authorization: owner.authorization } });
    expect(res.status).toBe(200);
    const plan = RunPlan.parse(await res.json());
    expect(plan.vertexCount).toBe(rows * cols);
    // Steps: each holds one label, bottom up, and together they hold every vertex once.
    const seen = plan.steps.flatMap((s) => s.vertices);
    expect(new Set(seen).size).toBe(rows * cols);
    for (const s of plan.steps) expect(new Set(s.vertices.map((v) => labels[v])).size).toBe(1);
    const stepLabels = plan.steps.map((s) => labels[s.vertices[0]!]!);
    expect([...stepLabels].sort((a, b) => a - b)).toEqual(stepLabels);
    // The forest: a parent always has a larger label; a vertex's neighbours are its ancestors or descendants.
    const ancestors = (v: number) => {
      const out = new Set<number>();
      for (let p = plan.forestParents[v]!; p >= 0; p = plan.forestParents[p]!) out.add(p);
      return out;
    };
    for (let v = 0; v < rows * cols; v++) {
      const p = plan.forestParents[v]!;
      if (p >= 0) expect(labels[p]!).toBeGreaterThan(labels[v]!);
      for (let w = 0; w < rows * cols; w++) if (adjacent(v, w)) expect(ancestors(v).has(w) || ancestors(w).has(v)).toBe(true);
    }
    // The ordering: every vertex once, labels never falling.
    expect(new Set(plan.order).size).toBe(rows * cols);
    for (let i = 1; i < plan.order.length; i++) expect(labels[plan.order[i]!]!).toBeGreaterThanOrEqual(labels[plan.order[i - 1]!]!);
  });

  it('hides a private run of someone else and serves the share link to anyone', async () => {
    const res = await fetch(`${base}/api/v1/runs/${runId}/plan`, { headers: { authorization: stranger.authorization } });
    // The run is shared by link, not public: reading it by id is for its owner (and admins).
    expect(res.status).toBe(404);
    const shared = await fetch(`${base}/api/v1/shared/plan-share-token-0001/plan`);
    expect(shared.status).toBe(200);
    expect(RunPlan.parse(await shared.json()).runId).toBe(runId);
    expect((await fetch(`${base}/api/v1/runs/${runId}/plan`)).status).toBe(401);
  });
});
