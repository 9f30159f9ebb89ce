import { completeGraph, gridGraph, pathGraph, verifyRanking } from '@cairn/engine';
import { RunList, RunView } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { api, bruteTreeDepth, startRunsHarness, waitForRun, type RunsHarness } from './runs-harness';
import { insertMemberWithKey } from './support/test-key';

// A run's whole life through the API, with the real queue (pg-boss in PostgreSQL) and the engine's
// worker threads: submit, compute, re-verify, read, list, share, export, delete.
vi.setConfig({ testTimeout: 60_000, hookTimeout: 60_000 });

let h: RunsHarness;
let alice: string;
let bob: string;
let admin: string;
let viewer: string;

beforeAll(async () => {
  h = await startRunsHarness('runs_life', { workers: true });
  alice = (await insertMemberWithKey(h.source, 'alice-life', 'researcher')).authorization;
  bob = (await insertMemberWithKey(h.source, 'bob-life', 'researcher')).authorization;
  admin = (await insertMemberWithKey(h.source, 'admin-life', 'admin')).authorization;
  viewer = (await insertMemberWithKey(h.source, 'viewer-life', 'viewer', ['runs:read', 'atlas:read'])).authorization;
});
afterAll(() => h?.close());

async function submit(authorization: string, body: unknown): Promise<{ status: number; run: RunView }> {
  const res = await api<RunView>(h, 'POST', '/api/v1/runs', authorization, body);
  return { status: res.status, run: res.body };
}

describe('a run from request to verified result', () => {
  it('computes grid:3x5 on a worker and stores a certificate the server re-verified', async () => {
    const { status, run } = await submit(alice, { spec: 'grid:3x5' });
    expect(status).toBe(202);
    expect(run).toMatchObject({ status: 'queued', specText: 'grid:3x5', graphKey: 'grid:3x5', family: 'grid', method: 'auto', timeLimitSeconds: 60, visibility: 'private', result: null });
    expect(run.owner.login).toBe('alice-life');
    const done = await waitForRun(h, run.id, alice);
    expect(done.status, JSON.stringify(done.error)).toBe('done');
    // The answer is the documented shape: the API, the CLI's --json and the web share one schema.
    expect(RunView.safeParse(done).error).toBeUndefined();
    expect(done.result!.verified).toBe(true);
    // The 15-vertex grid is small enough for the defining recursion, computed here apart from the engine.
    const g = gridGraph(3, 5);
    expect(done.rankNumber).toBe(bruteTreeDepth(15, g.edges()));
    expect(done.result!.rankNumber).toBe(done.rankNumber);
    // The stored certificate is a ranking of the grid with exactly rankNumber labels.
    const verdict = verifyRanking(g, done.result!.labels);
    expect(verdict).toMatchObject({ valid: true, maxLabel: done.rankNumber });
    const [row] = (await h.source.query(`SELECT status, attempts, worker, certificate, rank_number FROM runs WHERE id = $1`, [run.id])) as {
      status: string;
      attempts: number;
      worker: string;
      certificate: number[];
      rank_number: number;
    }[];
    expect(row).toMatchObject({ status: 'done', attempts: 1, rank_number: done.rankNumber });
    expect(row!.worker).toBe(h.jobs!.worker);
    expect(row!.certificate).toEqual(done.result!.labels);
  });

  it('matches published values: path:15 has rank number 4, complete:5 has 5', async () => {
    const path = (await submit(alice, { spec: { family: 'path', n: 15 } })).run;
    const complete = (await submit(alice, { spec: 'complete:5', method: 'formula' })).run;
    const p = await waitForRun(h, path.id, alice);
    const k = await waitForRun(h, complete.id, alice);
    // χr(P_n) = floor(log2 n) + 1 (Bodlaender et al., "Rankings of graphs", SIAM J. Discrete Math. 1998): 4 for n = 15.
    expect(p.rankNumber).toBe(Math.floor(Math.log2(15)) + 1);
    // χr(K_n) = n: every two vertices are adjacent, so no label repeats (common practice).
    expect(k.rankNumber).toBe(5);
    expect(k.provenance).toMatch(/^formula:/);
    expect(verifyRanking(pathGraph(15), p.result!.labels).valid).toBe(true);
    expect(verifyRanking(completeGraph(5), k.result!.labels).valid).toBe(true);
  });

  it('answers an identical request with the same run (200), also for the transposed grid', async () => {
    const first = await submit(alice, { spec: 'grid:2x7', timeLimitSeconds: 30 });
    expect(first.status).toBe(202);
    const again = await submit(alice, { spec: 'grid:2x7', timeLimitSeconds: 30 });
    expect(again.status).toBe(200);
    expect(again.run.id).toBe(first.run.id);
    const transposed = await submit(alice, { spec: { family: 'grid', rows: 7, cols: 2 }, timeLimitSeconds: 30 });
    expect(transposed.status).toBe(200);
    expect(transposed.run.id).toBe(first.run.id);
    await waitForRun(h, first.run.id, alice);
    // Still the same run once it is done: nothing is computed twice.
    expect((await submit(alice, { spec: 'grid:2x7', timeLimitSeconds: 30 })).run.id).toBe(first.run.id);
    // Another method, other limits or another member are other requests.
    expect((await submit(alice, { spec: 'grid:2x7', timeLimitSeconds: 31 })).status).toBe(202);
    expect((await submit(alice, { spec: 'grid:2x7', timeLimitSeconds: 30, method: 'bounds' })).status).toBe(202);
    expect((await submit(bob, { spec: 'grid:2x7', timeLimitSeconds: 30 })).status).toBe(202);
    const [{ n }] = (await h.source.query(`SELECT count(*)::int AS n FROM runs WHERE graph_key = 'grid:2x7'`)) as [{ n: number }];
    expect(n).toBe(4);
  });
});

describe('a run on an uploaded graph', () => {
  it('runs an upload by graphId, keyed by the SHA-256 of the file, and keeps it from other members', async () => {
    // The cycle on 6 vertices as a DIMACS file: χr(C_6) = 1 + floor(log2 5) + 1 = 4 (Bodlaender et al., SIAM J. Discrete Math. 1998).
    const body = new FormData();
    body.append('file', new Blob(['c the 6-cycle\np edge 6 6\ne 1 2\ne 2 3\ne 3 4\ne 4 5\ne 5 6\ne 6 1\n']), 'ring6.col');
    const uploaded = await fetch(`${h.base}/api/v1/graphs`, { method: 'POST', headers: { authorization: alice }, body });
    expect(uploaded.status).toBe(201);
    const { graph } = (await uploaded.json()) as { graph: { id: string; sha256: string } };
    const { status, run } = await submit(alice, { graphId: graph.id });
    expect(status).toBe(202);
    expect(run).toMatchObject({ graphKey: `upload:${graph.sha256}`, family: 'upload', specText: 'upload:ring6.col', spec: { family: 'upload', graphId: graph.id } });
    const done = await waitForRun(h, run.id, alice);
    expect(done.rankNumber).toBe(4);
    expect(done.result!.labels).toHaveLength(6);
    expect((await submit(alice, { spec: { family: 'upload', graphId: graph.id } })).run.id).toBe(run.id);
    const theirs = await api<{ error: { message: string } }>(h, 'POST', '/api/v1/runs', bob, { graphId: graph.id });
    expect(theirs.status).toBe(404);
    expect(theirs.body.error.message).toBe(`body.graphId: no uploaded graph ${graph.id}`);
    const entry = (await h.source.query(`SELECT family, vertex_count, edge_count, lower, upper FROM atlas_entries WHERE graph_key = $1`, [`upload:${graph.sha256}`])) as unknown[];
    expect(entry).toEqual([{ family: 'upload', vertex_count: 6, edge_count: 6, lower: 4, upper: 4 }]);
  });
});

describe('bad run requests', () => {
  const problem = async (body: unknown, status = 400) => {
    const res = await api<{ error: { code: string; message: string; details?: { problems: { field: string }[] } } }>(h, 'POST', '/api/v1/runs', alice, body);
    expect(res.status, JSON.stringify(res.body)).toBe(status);
    return res.body.error;
  };

  it('names body.spec for a spec the engine cannot read, with what it expected', async () => {
    const e = await problem({ spec: 'grid:4' });
    expect(e.code).toBe('invalid_request');
    expect(e.message).toMatch(/^body\.spec: .*expected grid:ROWSxCOLS/);
    expect((await problem({ spec: 'hexagon:5' })).message).toMatch(/^body\.spec: unknown graph family 'hexagon'/);
    expect((await problem({ spec: { family: 'grid', rows: 0, cols: 3 } })).message).toBe('body.spec.rows: rows must be at least 1');
    expect((await problem({ spec: 42 })).message).toMatch(/^body\.spec: expected a text spec/);
  });

  it('refuses specs that name files: the server reads no client paths', async () => {
    for (const spec of ['mask:/etc/passwd', 'tree:parents.txt', '/etc/hosts', 'graph.mtx']) {
      const e = await problem({ spec });
      expect(e.message, spec).toMatch(/^body\.spec: .*the server reads no files/);
    }
  });

  it('takes inline masks and parent arrays, and names what is wrong in them', async () => {
    const { status, run } = await submit(alice, { spec: { family: 'mask', text: '###\n#.#\n###' }, timeLimitSeconds: 10 });
    expect(status).toBe(202);
    expect(run.specText).toBe('mask:3x3 (8 cells)');
    expect(run.graphKey).toMatch(/^mask:3x3:[0-9a-f]{24}$/);
    // The 8-cycle of the ring: χr(C_8) = 1 + floor(log2 7) + 1 = 4 (Bodlaender et al., SIAM J. Discrete Math. 1998).
    expect((await waitForRun(h, run.id, alice)).rankNumber).toBe(4);
    expect((await problem({ spec: { family: 'tree', parents: [1, 0] } })).message).toMatch(/^body\.spec: tree: /);
  });

  it('refuses graphs over the size limit with 413 and a clear message', async () => {
    const e = await problem({ spec: 'grid:2000x2000' }, 413);
    expect(e.code).toBe('graph_too_large');
    expect(e.message).toMatch(/^body\.spec: grid:2000x2000 has 4000000 vertices; a researcher may run graphs of at most 250000 vertices and 1000000 edges/);
  });

  it('names the other fields: exactly one of spec and graphId, limits, method', async () => {
    expect((await problem({})).message).toMatch(/^body\.spec: give exactly one of spec/);
    expect((await problem({ spec: 'path:4', graphId: '00000000-0000-4000-8000-000000000000' })).message).toMatch(/^body\.spec: give exactly one/);
    expect((await problem({ spec: 'path:4', timeLimitSeconds: 0 })).message).toBe('body.timeLimitSeconds: timeLimitSeconds must be at least 1');
    expect((await problem({ spec: 'path:4', timeLimitSeconds: 100_000 })).message).toMatch(/^body\.timeLimitSeconds: .*at most 3600/);
    expect((await problem({ spec: 'path:4', method: 'guess' })).message).toMatch(/^body\.method: /);
    expect((await problem({ graphId: '00000000-0000-4000-8000-000000000000' }, 404)).message).toMatch(/^body\.graphId: no uploaded graph/);
  });

  it('needs runs:write to submit and a member to read', async () => {
    expect((await api(h, 'POST', '/api/v1/runs', viewer, { spec: 'path:3' })).status).toBe(403);
    expect((await api(h, 'POST', '/api/v1/runs', undefined, { spec: 'path:3' })).status).toBe(401);
    expect((await api(h, 'GET', '/api/v1/runs')).status).toBe(401);
  });
});

describe('who sees a run', () => {
  let privateRun: RunView;

  beforeAll(async () => {
    privateRun = await waitForRun(h, (await submit(alice, { spec: 'cycle:9' })).run.id, alice);
  });

  it('hides a private run of someone else as 404; admins see every run', async () => {
    expect((await api(h, 'GET', `/api/v1/runs/${privateRun.id}`, bob)).status).toBe(404);
    expect((await api(h, 'GET', `/api/v1/runs/${privateRun.id}`, admin)).status).toBe(200);
    expect((await api(h, 'GET', '/api/v1/runs/not-a-uuid', alice)).status).toBe(400);
  });

  it('lists own and public runs for members, every run for admins, with filters and pages', async () => {
    const bobs = await api<RunList>(h, 'GET', '/api/v1/runs?limit=100', bob);
    expect(bobs.body.runs.every((r) => r.owner.login === 'bob-life' || r.visibility === 'public')).toBe(true);
    expect(bobs.body.runs.some((r) => r.id === privateRun.id)).toBe(false);
    const all = await api<RunList>(h, 'GET', '/api/v1/runs?limit=100', admin);
    expect(RunList.safeParse(all.body).error).toBeUndefined();
    expect(all.body.runs.some((r) => r.id === privateRun.id)).toBe(true);
    // Summaries carry no certificate.
    expect(all.body.runs[0]).not.toHaveProperty('result');
    const mine = await api<RunList>(h, 'GET', '/api/v1/runs?owner=me&status=done&family=cycle', alice);
    expect(mine.body.runs.map((r) => r.id)).toEqual([privateRun.id]);
    const byLogin = await api<RunList>(h, 'GET', '/api/v1/runs?owner=alice-life&limit=100', admin);
    expect(byLogin.body.runs.every((r) => r.owner.login === 'alice-life')).toBe(true);
    // Cursor pages: newest first, no run twice, all of them in the end.
    const seen: string[] = [];
    let cursor: string | null = '';
    while (cursor !== null) {
      const page: { body: RunList } = await api<RunList>(h, 'GET', `/api/v1/runs?owner=me&limit=2${cursor ? `&cursor=${cursor}` : ''}`, alice);
      expect(page.body.runs.length).toBeLessThanOrEqual(2);
      seen.push(...page.body.runs.map((r) => r.id));
      cursor = page.body.nextCursor;
    }
    const everything = await api<RunList>(h, 'GET', '/api/v1/runs?owner=me&limit=100', alice);
    expect(seen).toEqual(everything.body.runs.map((r) => r.id));
    const offset = await api<RunList>(h, 'GET', '/api/v1/runs?owner=me&limit=2&offset=2', alice);
    expect(offset.body.runs.map((r) => r.id)).toEqual(seen.slice(2, 4));
    expect((await api(h, 'GET', '/api/v1/runs?limit=101', alice)).status).toBe(400);
    expect((await api(h, 'GET', '/api/v1/runs?cursor=nonsense', alice)).status).toBe(400);
    expect((await api(h, 'GET', '/api/v1/runs', viewer)).status).toBe(200);
  });

  it('makes a run public, shares it by link, and revokes the link by making it private', async () => {
    expect((await api(h, 'PATCH', `/api/v1/runs/${privateRun.id}`, bob, { visibility: 'public' })).status).toBe(404);
    const pub = await api<RunView>(h, 'PATCH', `/api/v1/runs/${privateRun.id}`, alice, { visibility: 'public' });
    expect(pub.body.visibility).toBe('public');
    expect((await api(h, 'GET', `/api/v1/runs/${privateRun.id}`, bob)).status).toBe(200);
    // Seen, but not bob's to change.
    expect((await api(h, 'PATCH', `/api/v1/runs/${privateRun.id}`, bob, { visibility: 'private' })).status).toBe(403);
    const link = await api<RunView>(h, 'PATCH', `/api/v1/runs/${privateRun.id}`, alice, { visibility: 'link' });
    const shared = link.body.links.shared!;
    expect(shared).toMatch(/\/shared\/[A-Za-z0-9_-]{32}$/);
    const token = shared.split('/').pop()!;
    const anonymous = await api<RunView>(h, 'GET', `/api/v1/shared/${token}`);
    expect(anonymous.status).toBe(200);
    expect(anonymous.body.id).toBe(privateRun.id);
    expect(anonymous.body.result?.labels).toEqual(privateRun.result!.labels);
    expect((await api(h, 'GET', `/api/v1/runs/${privateRun.id}`, bob)).status).toBe(404);
    await api(h, 'PATCH', `/api/v1/runs/${privateRun.id}`, alice, { visibility: 'private' });
    expect((await api(h, 'GET', `/api/v1/shared/${token}`)).status).toBe(404);
    expect((await api(h, 'PATCH', `/api/v1/runs/${privateRun.id}`, alice, { visibility: 'everyone' })).body).toMatchObject({ error: { code: 'invalid_request' } });
  });
});

describe('exports', () => {
  let grid: RunView;

  beforeAll(async () => {
    grid = await waitForRun(h, (await submit(alice, { spec: 'grid:3x4' })).run.id, alice);
  });

  const download = (id: string, format: string, authorization = alice) => fetch(`${h.base}/api/v1/runs/${id}/export?format=${format}`, { headers: { authorization } });

  it('exports JSON with the SolveResult and a file name that says what it is', async () => {
    const res = await download(grid.id, 'json');
    expect(res.status).toBe(200);
    expect(res.headers.get('content-disposition')).toMatch(new RegExp(`^attachment; filename="?cairn-grid-3x4-${grid.id.slice(0, 8)}\\.json"?$`));
    const body = (await res.json()) as RunView;
    expect(body.result).toEqual(grid.result);
  });

  it('exports CSV with one vertex,label row per vertex', async () => {
    const res = await download(grid.id, 'csv');
    expect(res.headers.get('content-type')).toMatch(/^text\/csv/);
    const lines = (await res.text()).trim().split('\n');
    expect(lines[0]).toBe('vertex,label');
    expect(lines.slice(1)).toEqual(grid.result!.labels.map((l, v) => `${v},${l}`));
  });

  it('draws grids as SVG and TikZ, and refuses to draw what it cannot draw legibly', async () => {
    const svg = await download(grid.id, 'svg');
    expect(svg.headers.get('content-type')).toMatch(/^image\/svg\+xml/);
    const picture = await svg.text();
    expect(picture.startsWith('<svg')).toBe(true);
    expect(picture.match(/<rect /g)).toHaveLength(12);
    const tikz = await (await download(grid.id, 'tikz')).text();
    expect(tikz).toContain('\\begin{tikzpicture}');
    expect(tikz.match(/\\node\[rectangle\]/g)).toHaveLength(12);
    const longPath = await waitForRun(h, (await submit(alice, { spec: 'path:300', method: 'formula' })).run.id, alice);
    const refused = await download(longPath.id, 'svg');
    expect(refused.status).toBe(400);
    const e = ((await refused.json()) as { error: { message: string } }).error;
    expect(e.message).toMatch(/^query\.format: svg draws grid-like graphs .* path:300 is 300 vertices and not grid-like/);
    expect((await download(grid.id, 'png')).status).toBe(400);
  });

  it('has nothing to export before there is a result', async () => {
    await h.stopWorkers();
    try {
      const queued = (await submit(alice, { spec: 'path:6', timeLimitSeconds: 77 })).run;
      const res = await download(queued.id, 'csv');
      expect(res.status).toBe(409);
      expect(((await res.json()) as { error: { code: string } }).error.code).toBe('no_result');
    } finally {
      await h.startWorkers();
    }
  });
});

describe('deleting a run', () => {
  it('removes the run for its owner and leaves the atlas value, without the run reference', async () => {
    const run = await waitForRun(h, (await submit(bob, { spec: 'star:6' })).run.id, bob);
    expect((await api(h, 'DELETE', `/api/v1/runs/${run.id}`, alice)).status).toBe(404);
    expect((await api(h, 'DELETE', `/api/v1/runs/${run.id}`, bob)).status).toBe(204);
    expect((await api(h, 'GET', `/api/v1/runs/${run.id}`, bob)).status).toBe(404);
    const [entry] = (await h.source.query(`SELECT lower, upper, lower_run_id, upper_run_id FROM atlas_entries WHERE graph_key = 'star:6'`)) as Record<string, unknown>[];
    // χr(K_{1,6}) = 2: the centre above, all leaves one label (common practice).
    expect(entry).toEqual({ lower: 2, upper: 2, lower_run_id: null, upper_run_id: null });
  });
});
