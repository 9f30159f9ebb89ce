import type { AtlasList, QuickAnswer, RunList } from '@cairn/schema';
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { HomePage } from '../src/routes/HomePage';
import { parseQuickInput } from '../src/components/run/spec-text';
import { RUN_ID, runSummary, runView } from './run-fixtures';
import { ME_RESEARCHER, ME_VISITOR, json, on, renderRoutes, stubFetch } from './support/render-page';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// An invented answer: these tests check what the page does with it, not the value itself.
const ANSWER: QuickAnswer = {
  spec: 'grid:4x9',
  graphKey: 'grid:4x9',
  vertexCount: 36,
  edgeCount: 59,
  lower: 5,
  upper: 7,
  rankNumber: null,
  source: 'bounds',
  lowerArgument: 'a contained 4 x 4 square',
  upperArgument: 'midline split',
  lowerRunId: null,
  upperRunId: '33333333-3333-4333-8333-333333333333',
};

const health = on('GET', '/api/health', () => json(200, { status: 'ok', db: 'ok', version: '0.1.0' }));
const quick = on('GET', '/api/v1/quick', (url) => json(200, { ...ANSWER, spec: url.searchParams.get('spec') }));

describe('parseQuickInput', () => {
  it.each([
    ['4x9', 'grid:4x9'],
    ['4 × 9', 'grid:4x9'],
    ['grid 4x9', 'grid:4x9'],
    ['Grid:4x9', 'grid:4x9'],
    ['staircase 7', 'staircase:7'],
    ['path:100', 'path:100'],
    ['cycle 9', 'cycle:9'],
    ['K5', 'complete:5'],
    ['K3,4', 'bipartite:3x4'],
    ['torus 4 5', 'torus:4x5'],
    ['star 8', 'star:8'],
    ['gnp 60 0.1', 'gnp:60:0.1:1'],
  ])('reads %s as %s', (input, spec) => {
    const read = parseQuickInput(input);
    expect(read).toMatchObject({ ok: true, spec });
  });

  it('refuses sizes the shared GraphSpec refuses, with its message', () => {
    expect(parseQuickInput('cycle 2')).toEqual({ ok: false, message: 'n must be at least 3' });
    expect(parseQuickInput('torus 2x5')).toEqual({ ok: false, message: 'rows must be at least 3' });
    expect(parseQuickInput('grid 5000x5000')).toMatchObject({ ok: false, message: expect.stringContaining('rows x cols') });
  });

  it('names an unknown family', () => {
    expect(parseQuickInput('blob 5')).toMatchObject({ ok: false, message: expect.stringContaining('"blob" is not a family') });
  });
});

describe('the home page quick box', () => {
  it('turns typed text into a spec, asks /quick and shows the answer with its arguments', async () => {
    const sent = stubFetch(health, quick, on('GET', '/api/v1/me', () => json(200, ME_VISITOR)), on('GET', '/api/v1/atlas', () => json(200, { entries: [], total: 0, nextOffset: null } satisfies AtlasList)));
    renderRoutes([{ path: '/', element: <HomePage /> }], '/');
    fireEvent.change(screen.getByLabelText('Graph'), { target: { value: 'grid 4x9' } });
    fireEvent.click(screen.getByRole('button', { name: 'Answer' }));
    const card = await screen.findByTestId('quick-answer');
    expect(sent.some((r) => r.url === '/api/v1/quick?spec=grid%3A4x9')).toBe(true);
    expect(card.textContent).toContain('rank number between 5 and 7');
    expect(card.textContent).toContain('a contained 4 x 4 square');
    expect(card.textContent).toContain('midline split');
    expect(within(card).getByRole('link', { name: 'the run with the ranking' }).getAttribute('href')).toBe('/runs/33333333-3333-4333-8333-333333333333');
    // A visitor is offered sign-in, not the run button.
    expect(within(card).getByRole('link', { name: 'Sign in' })).toBeTruthy();
    expect(within(card).queryByRole('button', { name: /Start/ })).toBeNull();
  });

  it('says what is wrong beside the box and asks nothing', async () => {
    const sent = stubFetch(health, quick, on('GET', '/api/v1/me', () => json(200, ME_VISITOR)));
    renderRoutes([{ path: '/', element: <HomePage /> }], '/');
    fireEvent.change(screen.getByLabelText('Graph'), { target: { value: 'cycle 2' } });
    fireEvent.click(screen.getByRole('button', { name: 'Answer' }));
    const input = screen.getByLabelText('Graph');
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(document.getElementById(input.getAttribute('aria-describedby')!)!.textContent).toBe('n must be at least 3');
    expect(sent.some((r) => r.url.startsWith('/api/v1/quick'))).toBe(false);
  });

  it('builds the spec from the family picker', async () => {
    const sent = stubFetch(health, quick, on('GET', '/api/v1/me', () => json(200, ME_VISITOR)));
    renderRoutes([{ path: '/', element: <HomePage /> }], '/');
    fireEvent.change(screen.getByLabelText('Family'), { target: { value: 'path' } });
    fireEvent.change(screen.getByLabelText('n'), { target: { value: '100' } });
    fireEvent.click(screen.getByRole('button', { name: 'Answer picked graph' }));
    await screen.findByTestId('quick-answer');
    expect(sent.some((r) => r.url === '/api/v1/quick?spec=path%3A100')).toBe(true);
    expect((screen.getByLabelText('Graph') as HTMLInputElement).value).toBe('path:100');
  });

  it('lets a member start a full run on the spec and goes to its page', async () => {
    const sent = stubFetch(
      health,
      quick,
      on('GET', '/api/v1/me', () => json(200, ME_RESEARCHER)),
      on('GET', '/api/v1/runs', () => json(200, { runs: [], nextCursor: null } satisfies RunList)),
      on('POST', '/api/v1/runs', () => json(202, runView({ status: 'queued', result: null, rankNumber: null, lower: null, upper: null, provenance: null }))),
    );
    const { router } = renderRoutes([{ path: '/', element: <HomePage /> }, { path: '/runs/:id', element: <p>run page</p> }], '/');
    await screen.findByText(/No finished runs yet/);
    fireEvent.change(screen.getByLabelText('Graph'), { target: { value: '4x9' } });
    fireEvent.click(screen.getByRole('button', { name: 'Answer' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Start a full run on grid:4x9' }));
    await waitFor(() => expect(router.state.location.pathname).toBe(`/runs/${RUN_ID}`));
    const post = sent.find((r) => r.method === 'POST')!;
    expect(post.body).toEqual({ spec: 'grid:4x9' });
    expect(post.headers['x-csrf-token']).toBe('csrf-token-1');
  });
});

describe('recent results on the home page', () => {
  it('lists finished runs for members', async () => {
    const sent = stubFetch(
      health,
      on('GET', '/api/v1/me', () => json(200, ME_RESEARCHER)),
      on('GET', '/api/v1/runs', () => json(200, { runs: [runSummary({ specText: 'staircase:6' })], nextCursor: null } satisfies RunList)),
    );
    renderRoutes([{ path: '/', element: <HomePage /> }], '/');
    const list = await screen.findByTestId('recent-runs');
    expect(within(list).getByRole('link', { name: 'staircase:6' }).getAttribute('href')).toBe(`/runs/${RUN_ID}`);
    expect(sent.some((r) => r.url === '/api/v1/runs?limit=8&status=done')).toBe(true);
    expect(sent.some((r) => r.url.startsWith('/api/v1/atlas'))).toBe(false);
  });

  it('shows the atlas to visitors, who may not list runs', async () => {
    // An invented atlas row (the page is under test, not the value).
    const atlas: AtlasList = {
      entries: [
        {
          graphKey: 'grid:3x5',
          family: 'grid',
          sizes: { rows: 3, cols: 5 },
          vertexCount: 15,
          edgeCount: 22,
          lower: 5,
          upper: 5,
          exact: true,
          rankNumber: 5,
          lowerProvenance: {},
          upperProvenance: {},
          lowerRunId: null,
          upperRunId: null,
          updatedAt: '2025-03-01T10:00:00.000Z',
        },
      ],
      total: 1,
      nextOffset: null,
    };
    const sent = stubFetch(health, on('GET', '/api/v1/me', () => json(200, ME_VISITOR)), on('GET', '/api/v1/atlas', () => json(200, atlas)));
    renderRoutes([{ path: '/', element: <HomePage /> }], '/');
    const list = await screen.findByTestId('recent-atlas');
    expect(list.textContent).toContain('grid:3x5');
    expect(sent.some((r) => r.url === '/api/v1/atlas?limit=8')).toBe(true);
    expect(sent.some((r) => r.url.startsWith('/api/v1/runs'))).toBe(false);
  });
});
