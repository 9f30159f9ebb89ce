import type { RunProgressEvent, RunView } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { openEventStreams } from '../src/services/run-events';
import { api, startRunsHarness, waitForRun, type RunsHarness } from './runs-harness';
import { insertMemberWithKey } from './support/test-key';

// GET /api/v1/runs/:id/events: server-sent events read from the database while a real worker computes.
vi.setConfig({ testTimeout: 60_000, hookTimeout: 60_000 });

let h: RunsHarness;
let owner: string;
let other: string;

beforeAll(async () => {
  h = await startRunsHarness('runs_events', { workers: true });
  owner = (await insertMemberWithKey(h.source, 'owner-events', 'researcher')).authorization;
  other = (await insertMemberWithKey(h.source, 'other-events', 'researcher')).authorization;
});
afterAll(() => h?.close());

interface Event {
  event: string;
  data: unknown;
}

/** Reads a whole event stream (until the server ends it, or `stopAfter` says so) into its events. */
async function readEvents(res: Response, stopAfter?: (e: Event) => boolean): Promise<{ events: Event[]; ended: boolean }> {
  const reader = res.body!.getReader();
  const decoder = new TextDecoder();
  const events: Event[] = [];
  let buffer = '';
  for (;;) {
    const { done, value } = await reader.read();
    if (done) return { events, ended: true };
    buffer += decoder.decode(value, { stream: true });
    let cut: number;
    while ((cut = buffer.indexOf('\n\n')) >= 0) {
      const block = buffer.slice(0, cut);
      buffer = buffer.slice(cut + 2);
      const event = /^event: (.*)$/m.exec(block)?.[1];
      const data = /^data: (.*)$/m.exec(block)?.[1];
      if (!event || data === undefined) continue;
      const e = { event, data: JSON.parse(data) as unknown };
      events.push(e);
      if (stopAfter?.(e)) {
        await reader.cancel();
        return { events, ended: false };
      }
    }
  }
}

const submit = async (body: unknown) => (await api<RunView>(h, 'POST', '/api/v1/runs', owner, body)).body;
const open = (id: string, authorization = owner, signal?: AbortSignal) => fetch(`${h.base}/api/v1/runs/${id}/events`, { headers: { authorization }, ...(signal ? { signal } : {}) });

describe('run events', () => {
  it('streams progress while the search runs, then the finished run, then ends', async () => {
    // A search the 3 s limit stops: it reports progress as it proves bounds.
    const run = await submit({ spec: 'grid:12x12', method: 'exact', timeLimitSeconds: 3 });
    const res = await open(run.id);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/^text\/event-stream/);
    const { events, ended } = await readEvents(res);
    expect(ended).toBe(true);
    const names = events.map((e) => e.event);
    expect(names).toContain('status');
    const progress = events.filter((e) => e.event === 'progress').map((e) => e.data as RunProgressEvent);
    expect(progress.length).toBeGreaterThan(0);
    for (const p of progress) {
      expect(p).toMatchObject({ status: 'running', nodes: expect.any(Number), lower: expect.any(Number), upper: expect.any(Number), elapsedMs: expect.any(Number) });
      expect(p.lower).toBeLessThanOrEqual(p.upper);
    }
    // Each progress event is a change: no report is sent twice.
    expect(new Set(progress.map((p) => JSON.stringify(p))).size).toBe(progress.length);
    expect(names[names.length - 1]).toBe('done');
    const final = events[events.length - 1]!.data as RunView;
    expect(final).toMatchObject({ id: run.id, status: 'done' });
    expect(final.result!.stats.stopReason).toBe('time-limit');
    expect(final.result!.lower).toBeGreaterThanOrEqual(progress[progress.length - 1]!.lower);
  });

  it('sends only the final event for a run that has already finished', async () => {
    const run = await waitForRun(h, (await submit({ spec: 'path:31' })).id, owner);
    const { events, ended } = await readEvents(await open(run.id));
    expect(ended).toBe(true);
    expect(events.map((e) => e.event)).toEqual(['done']);
    // χr(P_31) = floor(log2 31) + 1 = 5 (Bodlaender et al., SIAM J. Discrete Math. 1998).
    expect((events[0]!.data as RunView).rankNumber).toBe(5);
  });

  it('ends with cancelled when the run is cancelled, and lets go when the client leaves', async () => {
    const run = await submit({ spec: 'grid:12x12', method: 'exact', timeLimitSeconds: 600 });
    const leaving = new AbortController();
    const first = await open(run.id, owner, leaving.signal);
    await readEvents(first, (e) => e.event === 'progress');
    expect(openEventStreams()).toBe(1);
    leaving.abort();
    // The server notices the client has gone and stops polling for it.
    const deadline = Date.now() + 5000;
    while (openEventStreams() > 0 && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
    expect(openEventStreams()).toBe(0);

    const second = await open(run.id);
    const reading = readEvents(second);
    expect((await api(h, 'POST', `/api/v1/runs/${run.id}/cancel`, owner)).status).toBe(202);
    const { events, ended } = await reading;
    expect(ended).toBe(true);
    expect(events[events.length - 1]!.event).toBe('cancelled');
    expect((events[events.length - 1]!.data as RunView).result!.labels).toHaveLength(144);
  });

  it('is 404 for a private run of someone else and 401 without a key', async () => {
    const run = await submit({ spec: 'path:5' });
    expect((await open(run.id, other)).status).toBe(404);
    expect((await fetch(`${h.base}/api/v1/runs/${run.id}/events`)).status).toBe(401);
  });
});
