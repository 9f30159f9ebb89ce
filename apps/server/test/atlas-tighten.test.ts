import { AtlasEntryView, AtlasList, type RunView } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { createLogger } from '../src/logger';
import { tightenAtlas, type RunFinding } from '../src/services/atlas';
import { api, startRunsHarness, waitForRun, type RunsHarness } from './runs-harness';
import { insertMemberWithKey } from './support/test-key';

// The atlas: every finished run tightens the entry of its graph, side by side, and nothing weakens it.
vi.setConfig({ testTimeout: 90_000, hookTimeout: 60_000 });

let h: RunsHarness;
let alice: string;
let bob: string;
/** An admin's key: the entries below name every proving run (they are private by default) only to the runs' owners and admins. */
let admin: string;

beforeAll(async () => {
  h = await startRunsHarness('atlas_tighten', { workers: true });
  alice = (await insertMemberWithKey(h.source, 'alice-atlas', 'researcher')).authorization;
  bob = (await insertMemberWithKey(h.source, 'bob-atlas', 'researcher')).authorization;
  admin = (await insertMemberWithKey(h.source, 'ada-atlas', 'admin')).authorization;
});
afterAll(() => h?.close());

const run = async (authorization: string, body: unknown) => waitForRun(h, (await api<RunView>(h, 'POST', '/api/v1/runs', authorization, body)).body.id, authorization);
/** An entry as a reader sees it: the admin by default, null for an anonymous reader. */
const entry = async (key: string, authorization: string | null = admin) => (await api<AtlasEntryView>(h, 'GET', `/api/v1/atlas/${encodeURIComponent(key)}`, authorization ?? undefined)).body;

describe('tightening by runs', () => {
  it('records a bounds run, tightens to exact with an exact run, and a later weaker run changes nothing', async () => {
    const bounds = await run(alice, { spec: 'grid:5x5', method: 'bounds' });
    expect(bounds.rankNumber).toBeNull();
    let e = await entry('grid:5x5');
    expect(e).toMatchObject({ graphKey: 'grid:5x5', family: 'grid', sizes: { rows: 5, cols: 5 }, vertexCount: 25, edgeCount: 40, exact: false, rankNumber: null });
    expect([e.lower, e.upper]).toEqual([bounds.lower, bounds.upper]);
    expect(e.lower).toBeLessThan(e.upper);
    expect([e.lowerRunId, e.upperRunId]).toEqual([bounds.id, bounds.id]);

    const exact = await run(alice, { spec: 'grid:5x5', method: 'exact', timeLimitSeconds: 60 });
    expect(exact.rankNumber).not.toBeNull();
    e = await entry('grid:5x5');
    // Each side names the run that first reached it: the exact run proved the lower side; the upper side
    // is the bounds run's when its construction was already optimal.
    const upperRun = bounds.upper! > exact.upper! ? exact.id : bounds.id;
    expect(e).toMatchObject({ exact: true, rankNumber: exact.rankNumber, lower: exact.rankNumber, upper: exact.rankNumber, lowerRunId: exact.id, upperRunId: upperRun });
    expect(e.lowerProvenance).toMatchObject({ source: 'exact-search', value: 'exact-search' });
    expect(e.upperProvenance).toMatchObject({ construction: expect.any(String), verified: true });

    const later = await run(bob, { spec: 'grid:5x5', method: 'bounds' });
    expect(later.status).toBe('done');
    const after = await entry('grid:5x5');
    expect(after).toEqual(e);
  });

  it('files grid:4x3 and grid:3x4 under one entry', async () => {
    const wide = await run(alice, { spec: 'grid:3x4', method: 'bounds' });
    const tall = await run(bob, { spec: 'grid:4x3' });
    expect(wide.graphKey).toBe('grid:3x4');
    expect(tall.graphKey).toBe('grid:3x4');
    const rows = (await h.source.query(`SELECT graph_key FROM atlas_entries WHERE graph_key LIKE 'grid:%' AND (sizes->>'rows')::int IN (3, 4) AND (sizes->>'cols')::int IN (3, 4)`)) as { graph_key: string }[];
    expect(rows.map((r) => r.graph_key)).toEqual(['grid:3x4']);
    const e = await entry('grid:4x3');
    // The first run to reach a side keeps it; an equal value later does not take it over.
    expect(e).toMatchObject({ graphKey: 'grid:3x4', exact: true, rankNumber: tall.rankNumber, upperRunId: wide.upper! > tall.upper! ? tall.id : wide.id });
  });
});

describe('tightenAtlas under concurrent runs', () => {
  const finding = (runId: string, lower: number, upper: number): RunFinding => ({
    key: { key: 'grid:9x11', family: 'grid', sizes: { rows: 9, cols: 11 } },
    vertexCount: 99,
    edgeCount: 178,
    runId,
    lower,
    upper,
    lowerProvenance: { argument: `lower ${lower}` },
    upperProvenance: { construction: `upper ${upper}` },
  });

  it('lets two transactions on one graph take turns, so both improvements are kept', async () => {
    const logger = createLogger('silent');
    const [a, b] = (await h.source.query(`SELECT id FROM runs ORDER BY created_at LIMIT 2`)) as { id: string }[];
    let release!: () => void;
    const gate = new Promise<void>((r) => (release = r));
    let firstDone = false;
    // A holds the entry (just created) until the gate opens; B must wait for it, then improve the upper side.
    const first = h.source.transaction(async (m) => {
      await tightenAtlas(m, finding(a!.id, 8, 20), logger);
      await gate;
      firstDone = true;
    });
    await new Promise((r) => setTimeout(r, 200));
    const second = h.source.transaction(async (m) => {
      const t = await tightenAtlas(m, finding(b!.id, 7, 12), logger);
      expect(firstDone).toBe(true);
      return t;
    });
    await new Promise((r) => setTimeout(r, 300));
    release();
    await first;
    expect(await second).toEqual({ created: false, lower: false, upper: true });
    const e = await entry('grid:9x11');
    expect(e).toMatchObject({ lower: 8, upper: 12, exact: false, lowerRunId: a!.id, upperRunId: b!.id, lowerProvenance: { argument: 'lower 8' }, upperProvenance: { construction: 'upper 12' } });
  });

  it('never stores a finding that contradicts the entry', async () => {
    const [a] = (await h.source.query(`SELECT id FROM runs ORDER BY created_at LIMIT 1`)) as { id: string }[];
    const t = await h.source.transaction((m) => tightenAtlas(m, finding(a!.id, 13, 15), createLogger('silent')));
    expect(t).toEqual({ created: false, lower: false, upper: false });
    expect(await entry('grid:9x11')).toMatchObject({ lower: 8, upper: 12 });
  });
});

describe('reading the atlas', () => {
  it('is open to anonymous readers, filtered by family, sizes and exactness', async () => {
    const all = await api<AtlasList>(h, 'GET', '/api/v1/atlas?family=grid');
    expect(all.status).toBe(200);
    expect(AtlasList.safeParse(all.body).error).toBeUndefined();
    expect(AtlasEntryView.safeParse(all.body.entries[0]).error).toBeUndefined();
    expect(all.body.entries.map((e) => e.graphKey)).toEqual(['grid:3x4', 'grid:5x5', 'grid:9x11']);
    expect(all.body.total).toBe(3);
    const exact = await api<AtlasList>(h, 'GET', '/api/v1/atlas?family=grid&exact=true');
    expect(exact.body.entries.map((e) => e.graphKey)).toEqual(['grid:3x4', 'grid:5x5']);
    // Sizes are canonical (rows <= cols): rows 4, cols 3 finds grid:3x4.
    const transposed = await api<AtlasList>(h, 'GET', '/api/v1/atlas?family=grid&rows=4&cols=3');
    expect(transposed.body.entries.map((e) => e.graphKey)).toEqual(['grid:3x4']);
    const range = await api<AtlasList>(h, 'GET', '/api/v1/atlas?rowsFrom=4&rowsTo=9');
    expect(range.body.entries.map((e) => e.graphKey)).toEqual(['grid:5x5', 'grid:9x11']);
    const page = await api<AtlasList>(h, 'GET', '/api/v1/atlas?family=grid&limit=2');
    expect(page.body).toMatchObject({ total: 3, nextOffset: 2 });
    expect((await api<AtlasList>(h, 'GET', '/api/v1/atlas?family=grid&limit=2&offset=2')).body.entries.map((e) => e.graphKey)).toEqual(['grid:9x11']);
    // A page past the end still says how many there are; a filter matching nothing says 0.
    expect((await api<AtlasList>(h, 'GET', '/api/v1/atlas?family=grid&limit=2&offset=5')).body).toEqual({ entries: [], total: 3, nextOffset: null });
    expect((await api<AtlasList>(h, 'GET', '/api/v1/atlas?family=grid&rows=7')).body).toEqual({ entries: [], total: 0, nextOffset: null });
  });

  it('names a proving run only to readers who may open it (its owner, an admin, anyone once it is public)', async () => {
    const [row] = (await h.source.query(`SELECT lower_run_id FROM atlas_entries WHERE graph_key = 'grid:5x5'`)) as { lower_run_id: string }[];
    const runId = row!.lower_run_id;
    const seen = async (authorization: string | null) => {
      const one = await entry('grid:5x5', authorization);
      const listed = (await api<AtlasList>(h, 'GET', '/api/v1/atlas?family=grid&rows=5&cols=5', authorization ?? undefined)).body.entries[0]!;
      const quick = (await api<{ lowerRunId: string | null }>(h, 'GET', '/api/v1/quick?spec=grid%3A5x5', authorization ?? undefined)).body;
      expect(listed).toMatchObject({ graphKey: 'grid:5x5', lowerRunId: one.lowerRunId });
      expect(quick.lowerRunId).toBe(one.lowerRunId);
      expect(one.exact).toBe(true);
      return one.lowerRunId;
    };
    expect(await seen(null), 'anonymous').toBeNull();
    expect(await seen(bob), 'another researcher').toBeNull();
    expect(await seen(alice), 'its owner').toBe(runId);
    expect(await seen(admin), 'an admin').toBe(runId);
    const published = await api<RunView>(h, 'PATCH', `/api/v1/runs/${runId}`, alice, { visibility: 'public' });
    expect(published.status).toBe(200);
    expect(await seen(null), 'anonymous, once public').toBe(runId);
    expect(await seen(bob), 'another researcher, once public').toBe(runId);
  });

  it('names a bad filter and says 404 for a graph it does not know', async () => {
    const bad = await api<{ error: { message: string } }>(h, 'GET', '/api/v1/atlas?exact=maybe');
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBe('query.exact: exact must be true or false');
    expect((await api(h, 'GET', '/api/v1/atlas?rows=0')).status).toBe(400);
    const missing = await api<{ error: { message: string } }>(h, 'GET', '/api/v1/atlas/grid:30x31');
    expect(missing.status).toBe(404);
    expect(missing.body.error.message).toBe('the atlas has no entry for grid:30x31');
  });
});
