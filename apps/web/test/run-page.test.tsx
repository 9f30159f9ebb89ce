import type { RunPlan, RunView } from '@cairn/schema';
import { act, cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { RunPage } from '../src/pages/RunPage';
import { SharedRunPage } from '../src/pages/SharedRunPage';
import { provenanceWords } from '../src/components/run/words';
import { GRID_RESULT, RUN_ID, runView } from './run-fixtures';
import { ME_RESEARCHER, ME_VISITOR, json, on, renderRoutes, stubFetch, type Route } from './support/render-page';

/** Stands in for the browser's EventSource: the test sends the server's events by hand. */
class FakeEventSource {
  static instances: FakeEventSource[] = [];
  readyState = 0;
  onopen: ((e: Event) => void) | null = null;
  onerror: ((e: Event) => void) | null = null;
  private listeners = new Map<string, ((e: Event) => void)[]>();
  constructor(
    readonly url: string,
    readonly init?: EventSourceInit,
  ) {
    FakeEventSource.instances.push(this);
  }
  addEventListener(name: string, fn: (e: Event) => void) {
    this.listeners.set(name, [...(this.listeners.get(name) ?? []), fn]);
  }
  close() {
    this.readyState = 2;
  }
  open() {
    this.readyState = 1;
    this.onopen?.(new Event('open'));
  }
  emit(name: string, data: unknown) {
    for (const fn of this.listeners.get(name) ?? []) fn(new MessageEvent(name, { data: JSON.stringify(data) }));
  }
  fail(closed: boolean) {
    this.readyState = closed ? 2 : 0;
    this.onerror?.(new Event('error'));
  }
}

beforeEach(() => {
  FakeEventSource.instances = [];
  vi.stubGlobal('EventSource', FakeEventSource);
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// The 2 x 3 grid of the fixtures: its forest has vertex 4 at the root, then 1; 3 and 5 below 1; 0 under 3, 2 under 5.
const PLAN: RunPlan = {
  runId: RUN_ID,
  vertexCount: 6,
  forestParents: [3, 4, 5, 1, -1, 1],
  steps: [
    { step: 1, vertices: [0, 2], count: 2 },
    { step: 2, vertices: [3, 5], count: 2 },
    { step: 3, vertices: [1], count: 1 },
    { step: 4, vertices: [4], count: 1 },
  ],
  order: [0, 2, 3, 5, 1, 4],
};

const RUNNING: RunView = runView({ status: 'running', result: null, rankNumber: null, lower: null, upper: null, provenance: null, finishedAt: null });
const DONE: RunView = runView();

function renderRun(first: RunView, ...routes: Route[]) {
  let current = first;
  const sent = stubFetch(
    on('GET', '/api/v1/me', () => json(200, ME_RESEARCHER)),
    on('GET', `/api/v1/runs/${RUN_ID}`, () => json(200, current)),
    on('GET', `/api/v1/runs/${RUN_ID}/plan`, () => json(200, PLAN)),
    ...routes,
  );
  const utils = renderRoutes([{ path: '/runs/:id', element: <RunPage /> }], `/runs/${RUN_ID}`);
  return { sent, setRun: (r: RunView) => (current = r), ...utils };
}

describe('the run page', () => {
  it('shows live progress from the event stream, then the final value', async () => {
    const { setRun } = renderRun(RUNNING);
    expect(await screen.findByRole('heading', { name: 'Searching' })).toBeTruthy();
    const stream = FakeEventSource.instances.at(-1)!;
    expect(stream.url).toBe(`/api/v1/runs/${RUN_ID}/events`);
    act(() => {
      stream.open();
      stream.emit('progress', { status: 'running', nodes: 15000, lower: 3, upper: 5, elapsedMs: 30000 });
    });
    expect(screen.getByTestId('progress-nodes').textContent).toBe('15,000');
    expect(screen.getByTestId('progress-interval').textContent).toBe('between 3 and 5');
    const bar = screen.getByRole('progressbar', { name: 'Time used of the limit' });
    expect(Number(bar.getAttribute('aria-valuenow'))).toBeGreaterThanOrEqual(50);
    expect(screen.getByTestId('progress-figures').getAttribute('aria-live')).toBe('polite');

    setRun(DONE);
    act(() => stream.emit('done', DONE));
    expect((await screen.findByTestId('run-value')).textContent).toBe('rank number 4');
    expect(screen.getByTestId('run-provenance').textContent).toBe('exact: found by exhaustive search');
    expect(screen.getByTestId('run-verified').textContent).toBe('certificate verified');
    expect(stream.readyState).toBe(2); // closed, so the browser does not reconnect to a finished run
    expect(screen.queryByTestId('run-progress')).toBeNull();
    // The ranking drawn cell by cell, and the forest from the plan.
    expect(screen.getByTestId('ranking-picture').querySelectorAll('[data-vertex]')).toHaveLength(6);
    expect((await screen.findByTestId('forest-tree')).querySelectorAll('[data-vertex]')).toHaveLength(6);
    // Hovering a cell lights the cells above it in the forest (vertex 0: 3, 1 and 4).
    fireEvent.mouseEnter(screen.getByTestId('ranking-picture').querySelector('[data-vertex="0"]')!);
    expect(screen.getByTestId('hover-note').textContent).toContain('3 cells above it');
  });

  it('falls back to re-reading the run when the stream fails', async () => {
    const { sent } = renderRun(RUNNING);
    await screen.findByRole('heading', { name: 'Searching' });
    const reads = () => sent.filter((r) => r.url === `/api/v1/runs/${RUN_ID}`).length;
    const before = reads();
    act(() => FakeEventSource.instances.at(-1)!.fail(true));
    await waitFor(() => expect(reads()).toBeGreaterThan(before));
    expect(screen.getByText(/live feed unavailable/)).toBeTruthy();
  });

  it('lets the owner cancel a running run', async () => {
    const { sent } = renderRun(RUNNING, on('POST', `/api/v1/runs/${RUN_ID}/cancel`, () => json(202, { ...RUNNING, cancelRequested: true })));
    fireEvent.click(await screen.findByRole('button', { name: 'Cancel the run' }));
    expect(await screen.findByRole('button', { name: 'Cancel requested' })).toBeTruthy();
    const post = sent.find((r) => r.method === 'POST')!;
    expect(post.url).toBe(`/api/v1/runs/${RUN_ID}/cancel`);
    expect(post.headers['x-csrf-token']).toBe('csrf-token-1');
  });

  it('shows the step plan, the exports and the sharing controls of a finished run', async () => {
    const shared = `http://cairn.test/shared/${'t'.repeat(24)}`;
    const { sent } = renderRun(
      DONE,
      on('PATCH', `/api/v1/runs/${RUN_ID}`, () => json(200, { ...DONE, visibility: 'link', links: { ...DONE.links, shared } })),
      on('POST', `/api/v1/runs/${RUN_ID}/share`, () => json(200, { run: { ...DONE, visibility: 'link', links: { ...DONE.links, shared } }, url: shared, mailed: true })),
    );
    const plan = await screen.findByTestId('step-plan');
    const rows = within(plan).getAllByRole('row').slice(1);
    expect(rows.map((r) => r.textContent)).toEqual(['12(1,1), (1,3)', '22(2,1), (2,3)', '31(1,2)', '41(2,2)']);
    const exports = within(screen.getByTestId('exports')).getAllByRole('link');
    expect(exports.map((a) => a.getAttribute('href'))).toEqual(['json', 'csv', 'svg', 'tikz'].map((f) => `/api/v1/runs/${RUN_ID}/export?format=${f}`));

    fireEvent.change(screen.getByLabelText('Who sees this run'), { target: { value: 'link' } });
    expect((await screen.findByTestId('share-link') as HTMLInputElement).value).toBe(shared);
    expect(sent.find((r) => r.method === 'PATCH')!.body).toEqual({ visibility: 'link' });

    // The share form checks the address with the shared schema before sending.
    fireEvent.change(screen.getByLabelText('Send the link to'), { target: { value: 'not-an-address' } });
    fireEvent.click(screen.getByRole('button', { name: 'Share' }));
    expect(await screen.findByText('email must be an e-mail address')).toBeTruthy();
    fireEvent.change(screen.getByLabelText('Send the link to'), { target: { value: 'joiner@workshop.example' } });
    fireEvent.click(screen.getByRole('button', { name: 'Share' }));
    expect(await screen.findByText('The link was mailed.')).toBeTruthy();
    expect(sent.find((r) => r.url.endsWith('/share'))!.body).toEqual({ email: 'joiner@workshop.example' });
  });

  it('shows the server message for a run it may not see', async () => {
    stubFetch(
      on('GET', '/api/v1/me', () => json(200, ME_RESEARCHER)),
      on('GET', `/api/v1/runs/${RUN_ID}`, () => json(404, { error: { code: 'not_found', message: `no run ${RUN_ID}` } })),
    );
    renderRoutes([{ path: '/runs/:id', element: <RunPage /> }], `/runs/${RUN_ID}`);
    expect(await screen.findByRole('heading', { name: 'No such run' })).toBeTruthy();
    expect(screen.getByRole('alert').textContent).toBe(`no run ${RUN_ID}`);
  });

  it('draws a path as nodes and lines, one node per vertex', async () => {
    // P7 ranked 1 2 1 3 1 2 1: the rank number of P_n is ceil(log2(n + 1)) = 3 (Bodlaender et al., "Rankings of graphs", 1998).
    const path = runView({
      spec: { family: 'path', n: 7 },
      specText: 'path:7',
      result: { ...GRID_RESULT, graph: { vertexCount: 7, edgeCount: 6, family: { kind: 'path', n: 7 } }, rankNumber: 3, lower: 3, upper: 3, labels: [1, 2, 1, 3, 1, 2, 1] },
    });
    renderRun(path);
    const drawing = await screen.findByTestId('node-link');
    expect(drawing.querySelectorAll('[data-vertex]')).toHaveLength(7);
    expect(Array.from(drawing.querySelectorAll('[data-vertex]'), (g) => Number(g.getAttribute('data-label')))).toEqual([1, 2, 1, 3, 1, 2, 1]);
    expect((drawing.querySelector('[data-testid="node-link-edges"]')!.getAttribute('d')!.match(/M/g) ?? []).length).toBe(6);
  });

  it('says plainly when a random graph is too big to draw', async () => {
    const big = runView({
      spec: { family: 'gnp', n: 500, p: 0.01, seed: 1 },
      specText: 'gnp:500:0.01:1',
      result: { ...GRID_RESULT, graph: { vertexCount: 500, edgeCount: 1200, family: { kind: 'randomGraph', n: 500, p: 0.01, seed: 1 } }, labels: new Array(500).fill(1) },
    });
    renderRun(big);
    expect((await screen.findByText(/No picture of this ranking/)).textContent).toContain('cannot rebuild');
  });
});

describe('provenance in words', () => {
  it('writes closed forms and intervals with their arguments', () => {
    expect(
      provenanceWords({
        rankNumber: 4,
        lower: 4,
        upper: 4,
        provenance: { value: 'formula:path', lower: { argument: 'the path formula (Rankings of graphs, 1998)', source: 'formula:path' }, upper: { construction: 'midline split', argument: 'midline split' } },
      }),
    ).toBe('closed form: the path formula (Rankings of graphs, 1998)');
    expect(
      provenanceWords({
        rankNumber: null,
        lower: 5,
        upper: 6,
        provenance: { value: 'bound', lower: { argument: 'a contained 3 x 3 square', source: 'bound' }, upper: { construction: 'diagonal split', argument: 'diagonal split' } },
      }),
    ).toBe('between 5 and 6: lower bound by a contained 3 x 3 square, upper by diagonal split');
  });
});

describe('the shared run page', () => {
  it('shows the same read-only result to a visitor, with the share link exports', async () => {
    const token = 'a'.repeat(24);
    const sent = stubFetch(on('GET', '/api/v1/me', () => json(200, ME_VISITOR)), on('GET', `/api/v1/shared/${token}`, () => json(200, { ...DONE, visibility: 'link' })));
    renderRoutes([{ path: '/shared/:token', element: <SharedRunPage /> }], `/shared/${token}`);
    expect((await screen.findByTestId('run-value')).textContent).toBe('rank number 4');
    expect(screen.getByTestId('ranking-picture').querySelectorAll('[data-vertex]')).toHaveLength(6);
    expect(within(screen.getByTestId('exports')).getAllByRole('link')[0]!.getAttribute('href')).toBe(`/api/v1/shared/${token}/export?format=json`);
    expect(screen.queryByLabelText('Who sees this run')).toBeNull();
    // No member routes are asked: a visitor has no session.
    expect(sent.some((r) => r.url.startsWith('/api/v1/runs'))).toBe(false);
    // The step plan is read from the labels themselves.
    expect(within(screen.getByTestId('step-plan')).getAllByRole('row')).toHaveLength(5);
  });

  it('says when a share link leads nowhere', async () => {
    const token = 'b'.repeat(24);
    stubFetch(on('GET', `/api/v1/shared/${token}`, () => json(404, { error: { code: 'not_found', message: 'no run is shared with this link' } })));
    renderRoutes([{ path: '/shared/:token', element: <SharedRunPage /> }], `/shared/${token}`);
    expect(await screen.findByRole('heading', { name: 'This share link leads nowhere' })).toBeTruthy();
    expect(screen.getByRole('alert').textContent).toBe('no run is shared with this link');
  });
});
