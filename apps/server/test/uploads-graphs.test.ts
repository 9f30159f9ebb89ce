import { createHash } from 'node:crypto';
import { EnginePool } from '@cairn/engine/pool';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../src/index';
import { uploadForEngine } from '../src/services/graphs';
import { serveApp, type ServedApp } from './support/listen';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { testContext } from './support/test-context';
import { insertMemberWithKey } from './support/test-key';

// Uploads against the real PostgreSQL, through the whole app (Bearer keys, multer, the engine's readers).
const startApp = (tdb: TestDatabase, env: Record<string, string> = {}): Promise<ServedApp> => serveApp(createApp(testContext(tdb.db, {}, env)));

interface ErrorBody {
  error: { code: string; message: string; details?: Record<string, unknown> };
}
interface GraphBody {
  id: string;
  name: string;
  format: string;
  sha256: string;
  vertexCount: number;
  edgeCount: number;
  sizeBytes: number;
  owner: { id: string; login: string };
  createdAt: string;
}
interface UploadBody {
  graph: GraphBody;
  created: boolean;
  warnings: { kind: string; line: number; column: number; message: string }[];
  warningCount: number;
}

let tdb: TestDatabase;
let app: ServedApp;
let alice: { userId: string; authorization: string };
let bob: { userId: string; authorization: string };
let admin: { userId: string; authorization: string };
let viewer: { userId: string; authorization: string };

beforeAll(async () => {
  tdb = await createTestDatabase('uploads_graphs');
  const source = await tdb.db.connect();
  alice = await insertMemberWithKey(source, 'alice-uploads', 'researcher');
  bob = await insertMemberWithKey(source, 'bob-uploads', 'researcher');
  admin = await insertMemberWithKey(source, 'admin-uploads', 'admin');
  viewer = await insertMemberWithKey(source, 'viewer-uploads', 'viewer', ['runs:read']);
  app = await startApp(tdb);
});

afterAll(async () => {
  await app?.close();
  await tdb?.drop();
});

function form(content: string | Uint8Array, fileName: string, fields: Record<string, string> = {}): FormData {
  const body = new FormData();
  for (const [k, v] of Object.entries(fields)) body.append(k, v);
  body.append('file', new Blob([content]), fileName);
  return body;
}

async function upload(authorization: string, body: FormData, base = app.url): Promise<Response> {
  return fetch(`${base}/api/v1/graphs`, { method: 'POST', headers: { authorization }, body });
}

async function graphCount(): Promise<number> {
  const [{ count }] = (await (await tdb.db.connect()).query(`SELECT count(*)::int AS count FROM graphs`)) as [{ count: number }];
  return count;
}

// Small real files of known graphs; vertex and edge counts are those of the drawn graph.
const CYCLE4_DIMACS = 'c the 4-cycle\np edge 4 4\ne 1 2\ne 2 3\ne 3 4\ne 4 1\n';
const CYCLE4_PACE = 'c the 4-cycle, PACE style\np tw 4 4\n1 2\n2 3\n3 4\n4 1\n';
const PATH5_EDGES = '# the path on 5 vertices\n0 1\n1 2\n2 3\n3 4\n';
const K4_MTX = '%%MatrixMarket matrix coordinate pattern symmetric\n% K4, lower triangle\n4 4 6\n2 1\n3 1\n4 1\n3 2\n4 2\n4 3\n';
const STAR_JSON = '{\n  "vertexCount": 4,\n  "edges": [[0, 1], [0, 2], [0, 3]]\n}\n';
const RING_MASK = '###\n#.#\n###\n'; // 8 cells around a hole: the 8-cycle

describe('uploading each format', () => {
  const cases = [
    { file: 'c4.gr', content: CYCLE4_DIMACS, format: 'dimacs', vertices: 4, edges: 4 },
    { file: 'c4-pace.txt', content: CYCLE4_PACE, format: 'dimacs', vertices: 4, edges: 4 },
    { file: 'p5.edges', content: PATH5_EDGES, format: 'edge-list', vertices: 5, edges: 4 },
    { file: 'k4.mtx', content: K4_MTX, format: 'matrix-market', vertices: 4, edges: 6 },
    { file: 'star.json', content: STAR_JSON, format: 'json', vertices: 4, edges: 3 },
    { file: 'ring.txt', content: RING_MASK, format: 'mask', vertices: 8, edges: 8 },
  ];
  for (const c of cases) {
    it(`stores ${c.file} read as ${c.format} with its counts and hash`, async () => {
      const res = await upload(alice.authorization, form(c.content, c.file));
      expect(res.status).toBe(201);
      const body = (await res.json()) as UploadBody;
      expect(body.created).toBe(true);
      expect(body.graph).toMatchObject({ name: c.file, format: c.format, vertexCount: c.vertices, edgeCount: c.edges, sizeBytes: Buffer.byteLength(c.content) });
      expect(body.graph.sha256).toBe(createHash('sha256').update(c.content).digest('hex'));
      expect(body.graph.owner).toEqual({ id: alice.userId, login: 'alice-uploads' });
      const [row] = (await (await tdb.db.connect()).query(`SELECT name, format, vertex_count, edge_count, content FROM graphs WHERE id = $1`, [body.graph.id])) as {
        name: string;
        format: string;
        vertex_count: number;
        edge_count: number;
        content: Buffer;
      }[];
      expect(row).toMatchObject({ name: c.file, format: c.format, vertex_count: c.vertices, edge_count: c.edges });
      expect(row!.content.toString('utf8')).toBe(c.content);
    });
  }

  it('takes the format and name given in the form over detection', async () => {
    // Without the format this content would be detected as an edge list (no c/p line first).
    const pace = '1 2\n2 3\n3 1\n';
    const asEdges = (await (await upload(alice.authorization, form(pace, 'triangle.txt'))).json()) as UploadBody;
    expect(asEdges.graph.format).toBe('edge-list');
    const res = await upload(bob.authorization, form('p tw 3 3\n1 2\n2 3\n3 1\n', 'whatever.bin', { format: 'dimacs', name: 'Triangle (PACE)' }));
    expect(res.status).toBe(201);
    const body = (await res.json()) as UploadBody;
    expect(body.graph).toMatchObject({ name: 'Triangle (PACE)', format: 'dimacs', vertexCount: 3, edgeCount: 3 });
  });

  it('keeps a UTF-8 file name, without its directories', async () => {
    const res = await upload(alice.authorization, form('0 1\n1 2\n2 3\n3 4\n4 5\n', 'maillage/größe-ü.edges'));
    expect(res.status).toBe(201);
    const body = (await res.json()) as UploadBody;
    expect(body.graph.name).toBe('größe-ü.edges');
    const content = await fetch(`${app.url}/api/v1/graphs/${body.graph.id}/content`, { headers: { authorization: alice.authorization } });
    expect(content.headers.get('content-disposition')).toContain(`filename*=UTF-8''${encodeURIComponent('größe-ü.edges')}`);
  });

  it('reads a file of megabytes on a worker thread with the same counts, warnings and error places', async () => {
    // The path on 250 001 vertices, then a self-loop on the last line: over 1 MB, so read off the request thread.
    const lines = Array.from({ length: 250_000 }, (_, i) => `${i} ${i + 1}`);
    const big = `${lines.join('\n')}\n7 7\n`;
    expect(Buffer.byteLength(big)).toBeGreaterThan(1024 * 1024);
    let res = await upload(alice.authorization, form(big, 'long-path.edges'));
    expect(res.status).toBe(201);
    const body = (await res.json()) as UploadBody;
    expect(body.graph).toMatchObject({ format: 'edge-list', vertexCount: 250_001, edgeCount: 250_000 });
    expect(body.warnings).toEqual([expect.objectContaining({ kind: 'self-loop', line: 250_001, column: 1 })]);

    const broken = [...lines];
    broken[199_999] = '199999 2OOOOO';
    res = await upload(alice.authorization, form(broken.join('\n'), 'broken-path.edges'));
    expect(res.status).toBe(400);
    const error = (await res.json()) as ErrorBody;
    expect(error.error.code).toBe('parse_error');
    expect(error.error.message.startsWith('broken-path.edges:200000:8: ')).toBe(true);
    expect(error.error.details).toMatchObject({ line: 200_000, column: 8, found: '"2OOOOO"' });
  });

  it('returns the warnings of the reader (dropped self-loop and repeated edge) with their lines', async () => {
    const res = await upload(alice.authorization, form('1 2\n2 3\n3 3\n2 1\n', 'loopy.txt'));
    expect(res.status).toBe(201);
    const body = (await res.json()) as UploadBody;
    expect(body.graph).toMatchObject({ vertexCount: 3, edgeCount: 2 });
    expect(body.warningCount).toBe(2);
    expect(body.warnings.map((w) => [w.kind, w.line])).toEqual([
      ['self-loop', 3],
      ['duplicate-edge', 4],
    ]);
  });

  it('gives the same owner the stored record for the same bytes (200), and another owner a record of their own', async () => {
    const first = (await (await upload(alice.authorization, form(PATH5_EDGES, 'again.edges'))).json()) as UploadBody;
    expect(first.created).toBe(false); // stored in the first test under another name
    const res = await upload(alice.authorization, form(PATH5_EDGES, 'third-time.edges'));
    expect(res.status).toBe(200);
    const again = (await res.json()) as UploadBody;
    expect(again.graph.id).toBe(first.graph.id);
    expect(again.graph.name).toBe('p5.edges');
    const [{ count }] = (await (await tdb.db.connect()).query(`SELECT count(*)::int AS count FROM graphs WHERE owner_id = $1 AND sha256 = $2`, [alice.userId, first.graph.sha256])) as [
      { count: number },
    ];
    expect(count).toBe(1);
    const other = await upload(bob.authorization, form(PATH5_EDGES, 'p5.edges'));
    expect(other.status).toBe(201);
    expect(((await other.json()) as UploadBody).graph.id).not.toBe(first.graph.id);
  });
});

describe('refused uploads', () => {
  // A bad token on line 3 of each reader's input: the message names the file, line and column.
  const faults = [
    { file: 'bad.edges', content: '0 1\n1 2\n2 x\n', line: 3, column: 3, found: '"x"' },
    { file: 'bad.gr', content: 'p edge 4 4\ne 1 2\ne 2 q\ne 3 4\ne 4 1\n', line: 3, column: 5, found: '"q"' },
    { file: 'bad-pace.gr', content: 'p tw 4 4\n1 2\n2 3x\n3 4\n4 1\n', line: 3, column: 3, found: '"3x"' },
    { file: 'bad.mtx', content: '%%MatrixMarket matrix coordinate pattern symmetric\n3 3 2\n2 1\n3 y\n', line: 4, column: 3, found: '"y"' },
    { file: 'bad.json', content: '{\n  "vertexCount": 3,\n  "edges": [[0, 1], [1, "b"]]\n}\n', line: 3, column: 25, found: '"b"' },
    { file: 'bad.mask', content: '###\n#.#\n#x#\n', line: 3, column: 2, found: '"x"' },
  ];
  for (const f of faults) {
    it(`names line ${f.line} and column ${f.column} of ${f.file}`, async () => {
      const before = await graphCount();
      const res = await upload(alice.authorization, form(f.content, f.file));
      expect(res.status).toBe(400);
      const body = (await res.json()) as ErrorBody;
      expect(body.error.code).toBe('parse_error');
      expect(body.error.message.startsWith(`${f.file}:${f.line}:${f.column}: `)).toBe(true);
      expect(body.error.message).toContain(`found ${f.found}, expected `);
      expect(body.error.details).toMatchObject({ line: f.line, column: f.column, found: f.found });
      expect(typeof body.error.details!.expected).toBe('string');
      expect(await graphCount()).toBe(before);
    });
  }

  it('refuses binary data with a 400', async () => {
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);
    const res = await upload(alice.authorization, form(png, 'picture.png'));
    expect(res.status).toBe(400);
    const body = (await res.json()) as ErrorBody;
    expect(body.error.code).toBe('binary_file');
    expect(body.error.message).toMatch(/^picture\.png:\d+:\d+: binary data/);
  });

  it('refuses a file without vertices', async () => {
    const res = await upload(alice.authorization, form('# nothing here\n', 'empty.edges'));
    expect(res.status).toBe(400);
    expect(((await res.json()) as ErrorBody).error.code).toBe('empty_graph');
  });

  it('names the missing file, a file in the wrong field and an unknown format', async () => {
    const noFile = new FormData();
    noFile.append('name', 'nothing');
    let res = await upload(alice.authorization, noFile);
    expect(res.status).toBe(400);
    let body = (await res.json()) as ErrorBody;
    expect(body.error.code).toBe('invalid_request');
    expect(body.error.message).toMatch(/^body\.file: /);

    res = await fetch(`${app.url}/api/v1/graphs`, { method: 'POST', headers: { authorization: alice.authorization, 'content-type': 'application/json' }, body: '{"file": "0 1"}' });
    expect(res.status).toBe(400);
    expect(((await res.json()) as ErrorBody).error.message).toMatch(/^body\.file: send multipart\/form-data/);

    const wrongField = new FormData();
    wrongField.append('graph', new Blob(['0 1\n']), 'g.edges');
    res = await upload(alice.authorization, wrongField);
    expect(res.status).toBe(400);
    body = (await res.json()) as ErrorBody;
    expect(body.error.code).toBe('unexpected_file');
    expect(body.error.message).toContain('"graph"');

    const twoFiles = form('0 1\n', 'a.edges');
    twoFiles.append('file', new Blob(['1 2\n']), 'b.edges');
    res = await upload(alice.authorization, twoFiles);
    expect(res.status).toBe(400);
    expect(((await res.json()) as ErrorBody).error.code).toMatch(/^(too_many_files|unexpected_file)$/);

    res = await upload(alice.authorization, form('0 1\n', 'g.edges', { format: 'graphml' }));
    expect(res.status).toBe(400);
    body = (await res.json()) as ErrorBody;
    expect(body.error.code).toBe('invalid_request');
    expect(body.error.message).toMatch(/^body\.format: /);
  });

  it('answers a broken multipart body with a JSON 400', async () => {
    const res = await fetch(`${app.url}/api/v1/graphs`, {
      method: 'POST',
      headers: { authorization: alice.authorization, 'content-type': 'multipart/form-data; boundary=xyz' },
      body: '--xyz\r\nContent-Disposition: form-data; name="file"; filename="a.edges"\r\n\r\n0 1\n',
    });
    expect(res.status).toBe(400);
    expect(((await res.json()) as ErrorBody).error.code).toBe('invalid_form');
  });

  it('needs runs:write: anonymous 401, a read-only viewer key 403', async () => {
    let res = await fetch(`${app.url}/api/v1/graphs`, { method: 'POST', body: form(PATH5_EDGES, 'p5.edges') });
    expect(res.status).toBe(401);
    res = await upload(viewer.authorization, form(PATH5_EDGES, 'p5.edges'));
    expect(res.status).toBe(403);
  });

  it('refuses a file over the upload limit with 413 file_too_large and stores nothing; a file of exactly the limit is taken', async () => {
    const limitMb = 0.002;
    const limitBytes = Math.round(limitMb * 1024 * 1024);
    const small = await startApp(tdb, { CAIRN_UPLOAD_LIMIT_MB: String(limitMb) });
    try {
      const exact = `0 1\n# ${'x'.repeat(limitBytes - 7)}\n`;
      expect(Buffer.byteLength(exact)).toBe(limitBytes);
      const ok = await upload(alice.authorization, form(exact, 'exact.edges'), small.url);
      expect(ok.status).toBe(201);
      const before = await graphCount();
      const res = await upload(alice.authorization, form(`${exact}1 2\n`, 'big.edges'), small.url);
      expect(res.status).toBe(413);
      const body = (await res.json()) as ErrorBody;
      expect(body.error.code).toBe('file_too_large');
      expect(body.error.message).toContain('upload limit');
      expect(body.error.details).toMatchObject({ field: 'file', limitBytes });
      expect(await graphCount()).toBe(before);
    } finally {
      await small.close();
    }
  });
});

describe('reading, listing and deleting uploads', () => {
  let aliceGraph: GraphBody;
  let bobGraph: GraphBody;

  beforeAll(async () => {
    aliceGraph = ((await (await upload(alice.authorization, form('0 1\n1 2\n2 0\n2 3\n', 'paw.edges'))).json()) as UploadBody).graph;
    bobGraph = ((await (await upload(bob.authorization, form('0 1\n1 2\n2 3\n3 0\n0 2\n', 'diamond.edges'))).json()) as UploadBody).graph;
  });

  const get = (path: string, authorization: string) => fetch(`${app.url}/api/v1${path}`, { headers: { authorization } });

  it('shows a graph to its owner and to an admin, and is a 404 to anyone else', async () => {
    let res = await get(`/graphs/${aliceGraph.id}`, alice.authorization);
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual(aliceGraph);
    res = await get(`/graphs/${aliceGraph.id}`, admin.authorization);
    expect(res.status).toBe(200);
    res = await get(`/graphs/${aliceGraph.id}`, bob.authorization);
    expect(res.status).toBe(404);
    expect(((await res.json()) as ErrorBody).error.message).toBe(`no graph ${aliceGraph.id}`);
    res = await get(`/graphs/not-a-uuid`, alice.authorization);
    expect(res.status).toBe(400);
    expect(((await res.json()) as ErrorBody).error.message).toMatch(/^params\.id: /);
  });

  it('sends the stored bytes back under the file name', async () => {
    const res = await get(`/graphs/${aliceGraph.id}/content`, alice.authorization);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-disposition')).toMatch(/^attachment; filename="?paw\.edges"?$/);
    expect(res.headers.get('content-type')).toBe('text/plain; charset=utf-8');
    expect(await res.text()).toBe('0 1\n1 2\n2 0\n2 3\n');
    expect((await get(`/graphs/${aliceGraph.id}/content`, bob.authorization)).status).toBe(404);
  });

  it('lists own graphs newest first, every graph for an admin, in pages', async () => {
    const mine = (await (await get('/graphs?limit=100', alice.authorization)).json()) as { items: GraphBody[]; total: number; limit: number; offset: number };
    expect(mine.items.every((g) => g.owner.id === alice.userId)).toBe(true);
    expect(mine.items[0]!.id).toBe(aliceGraph.id);
    expect(mine.total).toBe(mine.items.length);
    const times = mine.items.map((g) => Date.parse(g.createdAt));
    expect([...times].sort((a, b) => b - a)).toEqual(times);

    const all = (await (await get('/graphs?limit=100', admin.authorization)).json()) as { items: GraphBody[]; total: number };
    const [{ count }] = (await (await tdb.db.connect()).query(`SELECT count(*)::int AS count FROM graphs`)) as [{ count: number }];
    expect(all.total).toBe(count);
    expect(all.items.map((g) => g.id)).toEqual(expect.arrayContaining([aliceGraph.id, bobGraph.id]));

    const page1 = (await (await get('/graphs?limit=2&offset=0', alice.authorization)).json()) as { items: GraphBody[]; total: number };
    const page2 = (await (await get('/graphs?limit=2&offset=2', alice.authorization)).json()) as { items: GraphBody[]; total: number };
    expect(page1.items.map((g) => g.id)).toEqual(mine.items.slice(0, 2).map((g) => g.id));
    expect(page2.items.map((g) => g.id)).toEqual(mine.items.slice(2, 4).map((g) => g.id));
    expect(page1.total).toBe(mine.total);

    const bad = await get('/graphs?limit=1000', alice.authorization);
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as ErrorBody).error.message).toMatch(/^query\.limit: /);
  });

  it('deletes a graph for its owner or an admin, not for others, and not while a run uses it (409)', async () => {
    const del = (id: string, authorization: string) => fetch(`${app.url}/api/v1/graphs/${id}`, { method: 'DELETE', headers: { authorization } });
    expect((await del(bobGraph.id, alice.authorization)).status).toBe(404);

    const source = await tdb.db.connect();
    const [run] = (await source.query(
      `INSERT INTO runs (owner_id, spec, graph_id, graph_key, family, method, request_hash) VALUES ($1, $2, $3, $4, 'upload', 'auto', 'uploads-test') RETURNING id`,
      [bob.userId, { family: 'upload', graphId: bobGraph.id }, bobGraph.id, `upload:${bobGraph.sha256}`],
    )) as { id: string }[];
    let res = await del(bobGraph.id, bob.authorization);
    expect(res.status).toBe(409);
    const body = (await res.json()) as ErrorBody;
    expect(body.error.code).toBe('graph_in_use');
    expect(body.error.details).toEqual({ runCount: 1 });
    await source.query(`DELETE FROM runs WHERE id = $1`, [run!.id]);

    res = await del(bobGraph.id, admin.authorization);
    expect(res.status).toBe(204);
    expect((await get(`/graphs/${bobGraph.id}`, bob.authorization)).status).toBe(404);
    res = await del(aliceGraph.id, alice.authorization);
    expect(res.status).toBe(204);
    const rows = (await source.query(`SELECT id FROM graphs WHERE id = ANY($1)`, [[aliceGraph.id, bobGraph.id]])) as unknown[];
    expect(rows).toEqual([]);
  });
});

describe('uploadForEngine', () => {
  it("gives a spec and files that the engine's pool solves on a worker thread as the same graph", async () => {
    const res = await upload(alice.authorization, form(K4_MTX.replace('K4', 'K4 for the pool'), 'k4-pool.mtx'));
    const stored = ((await res.json()) as UploadBody).graph;
    const source = await tdb.db.connect();
    const forEngine = await uploadForEngine(source, stored.id);
    expect(forEngine).not.toBeNull();
    expect(forEngine!.spec).toEqual({ family: 'file', file: 'k4-pool.mtx', format: 'matrix-market' });
    expect(Object.keys(forEngine!.files)).toEqual(['k4-pool.mtx']);
    expect(forEngine!.sha256).toBe(stored.sha256);
    expect(forEngine!.graph.id).toBe(stored.id);

    const pool = new EnginePool({ size: 1 });
    try {
      const result = await pool.run({ kind: 'solve', spec: forEngine!.spec, files: forEngine!.files, method: 'bounds' });
      if (result.kind !== 'solve') throw new Error('expected a solve result');
      expect(result.solution.graph.vertexCount).toBe(stored.vertexCount);
      expect(result.solution.graph.edgeCount).toBe(stored.edgeCount);
      // K4 needs a label per vertex: every ranking of a complete graph uses n labels (common practice).
      expect(result.solution.upper).toBe(4);
    } finally {
      await pool.close();
    }
  });

  it('is null for a graph that does not exist', async () => {
    const source = await tdb.db.connect();
    expect(await uploadForEngine(source, '00000000-0000-4000-8000-000000000000')).toBeNull();
    expect(await uploadForEngine(source, 'not-an-id')).toBeNull();
  });
});
