import { QuickAnswer } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../src/index';
import { serveApp, type ServedApp } from './support/listen';
import { testContext } from './support/test-context';
import { createTestDatabase, type TestDatabase } from './support/test-database';

let t: TestDatabase;
let served: ServedApp;
let base: string;

beforeAll(async () => {
  t = await createTestDatabase('quick');
  served = await serveApp(createApp(testContext(t.db)));
  base = served.url;
});
afterAll(async () => {
  await served.close();
  await t.drop();
});

const ask = async (spec: string) => {
  const res = await fetch(`${base}/api/v1/quick?spec=${encodeURIComponent(spec)}`);
  return { status: res.status, body: (await res.json()) as unknown };
};

describe('GET /api/v1/quick, open to visitors', () => {
  it('answers a path by its closed form: floor(log2 100) + 1 = 7 (Bodlaender et al., "Rankings of graphs", SIAM J. Discrete Math. 1998)', async () => {
    const { status, body } = await ask('path:100');
    expect(status).toBe(200);
    const a = QuickAnswer.parse(body);
    expect(a).toMatchObject({ source: 'formula', rankNumber: 7, lower: 7, upper: 7, vertexCount: 100, edgeCount: 99 });
    expect(a.lowerArgument).toMatch(/Rankings of graphs/);
  });

  it('bounds a grid with no closed form on the spot, the lower side never above the upper', async () => {
    const a = QuickAnswer.parse((await ask('grid:9x11')).body);
    expect(a.source).toBe('bounds');
    expect(a.vertexCount).toBe(99);
    expect(a.edgeCount).toBe(9 * 10 + 11 * 8);
    expect(a.lower).toBeGreaterThanOrEqual(1);
    expect(a.lower).toBeLessThanOrEqual(a.upper);
    expect(a.upper).toBeLessThan(99);
    expect(a.upperArgument.length).toBeGreaterThan(0);
  });

  it("answers from the atlas when it holds the graph, under either orientation, naming the proving runs", async () => {
    const source = await t.db.connect();
    await source.query(
      `INSERT INTO atlas_entries (graph_key, family, sizes, vertex_count, edge_count, lower, upper, exact, lower_provenance, upper_provenance)
       VALUES ('grid:5x8', 'grid', '{"rows":5,"cols":8}', 40, 67, 7, 8, false, '{"argument":"a contained rectangle"}', '{"argument":"midline split"}')`,
    );
    const a = QuickAnswer.parse((await ask('grid:8x5')).body);
    expect(a).toMatchObject({ source: 'atlas', graphKey: 'grid:5x8', lower: 7, upper: 8, rankNumber: null, lowerArgument: 'a contained rectangle' });
  });

  it('names the field and what was expected for a bad spec, and refuses file specs', async () => {
    const bad = await ask('grid:4by9');
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body)).toMatch(/query\.spec/);
    const file = await ask('mask:/etc/passwd');
    expect(file.status).toBe(400);
    expect(JSON.stringify(file.body)).toMatch(/reads no files/);
    const missing = await fetch(`${base}/api/v1/quick`);
    expect(missing.status).toBe(400);
  });
});
