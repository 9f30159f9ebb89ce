import express from 'express';
import { bestUpperBound, cycleGraph, gridGraph, pathGraph, type Graph } from '@cairn/engine';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { installAuth } from '../src/auth/install-auth';
import { errorHandler } from '../src/http/errors';
import { createApp } from '../src/index';
import { verifyRouter } from '../src/routes/verify.router';
import { serveApp, type ServedApp } from './support/listen';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { testContext } from './support/test-context';
import { insertMemberWithKey } from './support/test-key';

// POST /api/v1/verify through the whole app, against the real PostgreSQL (for uploaded graphs).
interface ErrorBody {
  error: { code: string; message: string; details?: Record<string, unknown> };
}
interface Verdict {
  valid: boolean;
  labelCount: number;
  maxLabel: number;
  vertexCount: number;
  violation?: { label: number; u: number; v: number; path: number[]; message: string };
}

let tdb: TestDatabase;
let served: ServedApp;
let base: string;
let alice: { authorization: string };
let bob: { authorization: string };
let viewer: { authorization: string };

beforeAll(async () => {
  tdb = await createTestDatabase('verify_rankings');
  const source = await tdb.db.connect();
  alice = await insertMemberWithKey(source, 'alice-verify', 'researcher');
  bob = await insertMemberWithKey(source, 'bob-verify', 'researcher');
  viewer = await insertMemberWithKey(source, 'viewer-verify', 'viewer', ['runs:read']);
  served = await serveApp(createApp(testContext(tdb.db)));
  base = served.url;
});

afterAll(async () => {
  await served?.close();
  await tdb?.drop();
});

function verify(body: unknown, authorization = alice.authorization, at = base): Promise<Response> {
  return fetch(`${at}/api/v1/verify`, { method: 'POST', headers: { authorization, 'content-type': 'application/json' }, body: JSON.stringify(body) });
}

async function verdictOf(res: Response): Promise<Verdict> {
  expect(res.status).toBe(200);
  return (await res.json()) as Verdict;
}

/**
 * A violation is real when its path runs along edges of the graph from u to v, both ends carry the
 * violated label, and every inner vertex has a smaller one (the definition of a ranking).
 */
function expectRealViolation(g: Graph, labels: number[], violation: NonNullable<Verdict['violation']>): void {
  const { path, u, v, label } = violation;
  expect(path.length).toBeGreaterThanOrEqual(2);
  expect(path[0]).toBe(u);
  expect(path.at(-1)).toBe(v);
  expect(u).not.toBe(v);
  expect(labels[u]).toBe(label);
  expect(labels[v]).toBe(label);
  // Plain loops, one assertion each: a violation path may run through a hundred thousand vertices.
  const notEdges = path.slice(1).filter((w, i) => ![...g.neighbours(path[i]!)].includes(w));
  expect(notEdges, 'steps of the path that are not edges').toEqual([]);
  const notSmaller = path.slice(1, -1).filter((w) => !(labels[w]! < label));
  expect(notSmaller, 'inner vertices whose label is not smaller').toEqual([]);
  expect(new Set(path).size).toBe(path.length);
}

/** The ruler sequence: vertex i of a path gets 1 + the number of times 2 divides i + 1, a ranking of the path (common practice). */
function rulerLabels(n: number): number[] {
  return Array.from({ length: n }, (_, i) => {
    let k = 1;
    for (let x = i + 1; x % 2 === 0; x /= 2) k++;
    return k;
  });
}

describe('verifying rankings', () => {
  const grid = gridGraph(4, 9);
  const certificate = [...bestUpperBound(grid).best.labels];

  it("accepts the engine's upper-bound certificate of grid:4x9, by text spec and by JSON spec", async () => {
    const distinct = new Set(certificate).size;
    const byText = await verdictOf(await verify({ spec: 'grid:4x9', labels: certificate }));
    expect(byText).toEqual({ valid: true, labelCount: distinct, maxLabel: Math.max(...certificate), vertexCount: 36 });
    const byJson = await verdictOf(await verify({ spec: { family: 'grid', rows: 4, cols: 9 }, labels: certificate }));
    expect(byJson).toEqual(byText);
  });

  it('refuses two labels on grid:4x9 with a real violation path', async () => {
    // Two labels rank only graphs of tree-depth <= 2 (stars); the grid contains a path on 4 vertices,
    // whose tree-depth is 3 (Bodlaender et al., "Rankings of graphs", SIAM J. Discrete Math. 1998).
    const labels = certificate.map((l) => Math.min(l, 2));
    const verdict = await verdictOf(await verify({ spec: 'grid:4x9', labels }));
    expect(verdict.valid).toBe(false);
    expect(verdict.vertexCount).toBe(36);
    expectRealViolation(grid, labels, verdict.violation!);
    expect(verdict.violation!.message).toContain(`label ${verdict.violation!.label}`);
  });

  it('finds the clash of two 2s joined through a 1 on a path', async () => {
    const labels = [1, 2, 1, 2, 1, 2, 1];
    const verdict = await verdictOf(await verify({ spec: 'path:7', labels }));
    expect(verdict.valid).toBe(false);
    expect(verdict.violation!.label).toBe(2);
    expect(verdict.violation!.path).toHaveLength(3);
    expectRealViolation(pathGraph(7), labels, verdict.violation!);
    // The ruler sequence is a ranking of the same path.
    expect((await verdictOf(await verify({ spec: 'path:7', labels: rulerLabels(7) }))).valid).toBe(true);
  });

  it('checks a graph of hundreds of thousands of vertices on a worker thread with the same verdicts', async () => {
    const n = 200_000;
    const ruler = rulerLabels(n);
    expect(await verdictOf(await verify({ spec: `path:${n}`, labels: ruler }))).toEqual({ valid: true, labelCount: 18, maxLabel: 18, vertexCount: n });
    // Vertex 131071 holds the only 18 (131072 = 2^17); a second 18 far away clashes through smaller labels.
    const broken = [...ruler];
    broken[5] = 18;
    const verdict = await verdictOf(await verify({ spec: `path:${n}`, labels: broken }));
    expect(verdict.valid).toBe(false);
    expect(verdict.violation!.label).toBe(18);
    expectRealViolation(pathGraph(n), broken, verdict.violation!);
    const short = await verify({ spec: `path:${n}`, labels: ruler.slice(1) });
    expect(short.status).toBe(400);
    expect(((await short.json()) as ErrorBody).error.message).toMatch(/^body\.labels: /);
  }, 60_000);

  it('checks masks and trees sent inline in the JSON form', async () => {
    // A 2x2 block of cells is the 4-cycle; 1,2 / 3,1 ranks it (the two 1s are separated by 2 and 3).
    const mask = await verdictOf(await verify({ spec: { family: 'mask', text: '##\n##\n' }, labels: [1, 2, 3, 1] }));
    expect(mask).toMatchObject({ valid: true, vertexCount: 4 });
    const tree = await verdictOf(await verify({ spec: { family: 'tree', parents: [-1, 0, 0, 1] }, labels: [3, 2, 1, 1] }));
    expect(tree).toMatchObject({ valid: true, vertexCount: 4 });
  });
});

describe('refused verification requests', () => {
  it('names body.labels for the wrong number of labels and for labels that are not positive whole numbers', async () => {
    for (const labels of [[1, 2, 1], [1, 2, 1, 3, 1, 2, 1, 4], [1, 0, 1, 2, 1, 0, 1], [1, 2, 1.5, 3, 1, 2, 1], [1, 2, -1, 3, 1, 2, 1]]) {
      const res = await verify({ spec: 'path:7', labels });
      expect(res.status).toBe(400);
      const body = (await res.json()) as ErrorBody;
      expect(body.error.code).toBe('invalid_request');
      expect(body.error.message).toMatch(/^body\.labels: /);
      expect(body.error.details).toMatchObject({ problems: [{ field: 'body.labels' }] });
    }
    const notArray = await verify({ spec: 'path:7', labels: 'one two' });
    expect(notArray.status).toBe(400);
    expect(((await notArray.json()) as ErrorBody).error.message).toMatch(/^body\.labels: /);
  });

  it('names body.spec for specs that do not parse, that name files, or that are missing', async () => {
    const cases: [unknown, RegExp][] = [
      ['grid:4', /^body\.spec: /],
      ['mask:shape.txt', /^body\.spec: .*names a file/],
      ['tree:parents.txt', /^body\.spec: .*names a file/],
      ['graphs/big.gr', /^body\.spec: .*names a file/],
      [{ family: 'grid', rows: 0, cols: 3 }, /^body\.spec\.rows: /],
      [{ family: 'hypercube', n: 3 }, /^body\.spec: /],
      [{ family: 'mask', text: '#x\n' }, /^body\.spec\.text: /],
    ];
    for (const [spec, message] of cases) {
      const res = await verify({ spec, labels: [1] });
      expect(res.status, JSON.stringify(spec)).toBe(400);
      expect(((await res.json()) as ErrorBody).error.message).toMatch(message);
    }
    const none = await verify({ labels: [1] });
    expect(none.status).toBe(400);
    expect(((await none.json()) as ErrorBody).error.message).toMatch(/^body\.spec: send either spec or graphId/);
    const both = await verify({ spec: 'path:1', graphId: '00000000-0000-4000-8000-000000000000', labels: [1] });
    expect(both.status).toBe(400);
  });

  it('refuses graphs over the size limit with 413 before building them', async () => {
    for (const spec of ['grid:3000x3000', 'complete:6000', { family: 'torus', rows: 2000, cols: 2001 }]) {
      const res = await verify({ spec, labels: [1] });
      expect(res.status, JSON.stringify(spec)).toBe(413);
      const body = (await res.json()) as ErrorBody;
      expect(body.error.code).toBe('graph_too_large');
      expect(body.error.details).toMatchObject({ field: 'body.spec' });
    }
  });

  it('needs runs:write', async () => {
    expect((await fetch(`${base}/api/v1/verify`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{}' })).status).toBe(401);
    expect((await verify({ spec: 'path:1', labels: [1] }, viewer.authorization)).status).toBe(403);
  });
});

describe('verifying against an uploaded graph', () => {
  let graphId: string;

  beforeAll(async () => {
    const form = new FormData();
    form.append('file', new Blob(['p edge 4 4\ne 1 2\ne 2 3\ne 3 4\ne 4 1\n']), 'c4.gr');
    const res = await fetch(`${base}/api/v1/graphs`, { method: 'POST', headers: { authorization: alice.authorization }, body: form });
    expect(res.status).toBe(201);
    graphId = ((await res.json()) as { graph: { id: string } }).graph.id;
  });

  it('reads the stored graph by graphId or by an upload spec', async () => {
    // Vertices 0..3 are the file's 1..4 around the cycle; the two 1s are separated by 2 and by 3.
    const good = [1, 2, 1, 3];
    expect(await verdictOf(await verify({ graphId, labels: good }))).toMatchObject({ valid: true, vertexCount: 4, labelCount: 3 });
    expect(await verdictOf(await verify({ spec: { family: 'upload', graphId }, labels: good }))).toMatchObject({ valid: true });
    const bad = [1, 2, 1, 2];
    const verdict = await verdictOf(await verify({ graphId, labels: bad }));
    expect(verdict.valid).toBe(false);
    expectRealViolation(cycleGraph(4), bad, verdict.violation!);
  });

  it("is a 404 for someone else's upload", async () => {
    const res = await verify({ graphId, labels: [1, 2, 1, 3] }, bob.authorization);
    expect(res.status).toBe(404);
    expect(((await res.json()) as ErrorBody).error.code).toBe('not_found');
  });
});

describe("the verify route's own body limit", () => {
  // The route parses bodies up to 32 MB itself; this app mounts it without any other body parser.
  let own: ServedApp;

  beforeAll(async () => {
    const bare = express();
    installAuth(bare, testContext(tdb.db));
    bare.use('/api/v1', verifyRouter(testContext(tdb.db)));
    bare.use(errorHandler(testContext(tdb.db).logger));
    own = await serveApp(bare);
  });

  afterAll(() => own?.close());

  it('takes labels of megabytes and refuses a body over 32 MB with a JSON 413', async () => {
    const n = 1_000_000;
    const body = { spec: `path:${n}`, labels: rulerLabels(n) };
    expect(JSON.stringify(body).length).toBeGreaterThan(1024 * 1024); // beyond the 1 MB the rest of the API takes
    expect(await verdictOf(await verify(body, alice.authorization, own.url))).toEqual({ valid: true, labelCount: 20, maxLabel: 20, vertexCount: n });

    const huge = `{"spec": "path:3", "labels": [${'1,'.repeat(17 * 1024 * 1024)}1]}`;
    const res = await fetch(`${own.url}/api/v1/verify`, { method: 'POST', headers: { authorization: alice.authorization, 'content-type': 'application/json' }, body: huge });
    expect(res.status).toBe(413);
    expect(((await res.json()) as ErrorBody).error.code).toBe('body_too_large');
  });
});
