import type { MeResponse, RunList } from '@cairn/schema';
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { RunsPage } from '../src/pages/RunsPage';
import { runSummary } from './run-fixtures';
import { ME_RESEARCHER, ME_VISITOR, json, on, renderRoutes, stubFetch, uuid } from './support/render-page';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// Two pages: runs 1-3 then 4-5, newest first; the server's cursor after run 3 is "after-3". The values are
// invented for the table (path:100's 7 is ceil(log2 101), Bodlaender et al., "Rankings of graphs", 1998).
const PAGE_1: RunList = {
  runs: [
    runSummary({ id: uuid(1), specText: 'grid:4x9', rankNumber: null, lower: 5, upper: 6, provenance: 'bound', status: 'done' }),
    runSummary({ id: uuid(2), specText: 'staircase:7', rankNumber: 5, lower: 5, upper: 5, status: 'done' }),
    runSummary({ id: uuid(3), specText: 'path:100', rankNumber: 7, lower: 7, upper: 7, provenance: 'formula:path', status: 'done' }),
  ],
  nextCursor: 'after-3',
};
const PAGE_2: RunList = {
  runs: [
    runSummary({ id: uuid(4), specText: 'cycle:9', status: 'failed', rankNumber: null, lower: null, upper: null, provenance: null, error: { code: 'x', message: 'x' } }),
    runSummary({ id: uuid(5), specText: 'torus:4x4', status: 'queued', rankNumber: null, lower: null, upper: null, provenance: null, startedAt: null, finishedAt: null }),
  ],
  nextCursor: null,
};

function renderRuns(me: MeResponse = ME_RESEARCHER, empty = false) {
  const sent = stubFetch(
    on('GET', '/api/v1/me', () => json(200, me)),
    on('GET', '/api/v1/runs', (url) => json(200, empty ? { runs: [], nextCursor: null } : url.searchParams.get('cursor') === 'after-3' ? PAGE_2 : PAGE_1)),
  );
  const utils = renderRoutes([{ path: '/runs', element: <RunsPage /> }], '/runs');
  return { sent, ...utils };
}

const specs = () => within(screen.getByTestId('runs-table')).getAllByTestId('run-row').map((r) => within(r).getAllByRole('cell')[1]!.textContent);
const listRequests = (sent: { url: string }[]) => sent.filter((r) => r.url.startsWith('/api/v1/runs'));

describe('the runs page', () => {
  it('renders one row per run with its value or bounds', async () => {
    renderRuns();
    await screen.findByTestId('runs-table');
    expect(specs()).toEqual(['grid:4x9', 'staircase:7', 'path:100']);
    const first = within(screen.getAllByTestId('run-row')[0]!).getAllByRole('cell');
    expect(first[2]!.textContent).toContain('5–6');
    expect(first[2]!.textContent).toContain('bounds');
    expect(within(first[1]!).getByRole('link').getAttribute('href')).toBe(`/runs/${uuid(1)}`);
  });

  it('asks the server for the next page with the cursor, and goes back with the stack', async () => {
    const { sent } = renderRuns();
    await screen.findByTestId('runs-table');
    fireEvent.click(screen.getByRole('button', { name: 'Next' }));
    await waitFor(() => expect(specs()).toEqual(['cycle:9', 'torus:4x4']));
    expect(listRequests(sent).at(-1)!.url).toBe('/api/v1/runs?limit=25&cursor=after-3');
    expect((screen.getByRole('button', { name: 'Next' }) as HTMLButtonElement).disabled).toBe(true);
    expect(screen.getByText('page 2')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Previous' }));
    await waitFor(() => expect(specs()).toEqual(['grid:4x9', 'staircase:7', 'path:100']));
    expect((screen.getByRole('button', { name: 'Previous' }) as HTMLButtonElement).disabled).toBe(true);
  });

  it('sorts the loaded page by value without asking the server', async () => {
    const { sent } = renderRuns();
    await screen.findByTestId('runs-table');
    const before = listRequests(sent).length;
    fireEvent.click(screen.getByRole('button', { name: /^Value/ }));
    expect(specs()).toEqual(['staircase:7', 'grid:4x9', 'path:100']);
    expect(screen.getByRole('columnheader', { name: /Value/ }).getAttribute('aria-sort')).toBe('ascending');
    fireEvent.click(screen.getByRole('button', { name: /^Value/ }));
    expect(specs()).toEqual(['path:100', 'grid:4x9', 'staircase:7']);
    expect(listRequests(sent).length).toBe(before);
  });

  it('sends the filters to the server and starts again from the first page', async () => {
    const { sent } = renderRuns();
    await screen.findByTestId('runs-table');
    fireEvent.click(screen.getByRole('button', { name: 'Next' }));
    await waitFor(() => expect(specs()).toEqual(['cycle:9', 'torus:4x4']));
    fireEvent.change(screen.getByLabelText('Status'), { target: { value: 'failed' } });
    fireEvent.change(screen.getByLabelText('Family'), { target: { value: 'grid' } });
    fireEvent.change(screen.getByLabelText('Whose'), { target: { value: 'me' } });
    await waitFor(() => expect(listRequests(sent).at(-1)!.url).toBe('/api/v1/runs?limit=25&status=failed&family=grid&owner=me'));
  });

  it('says so when there are no runs', async () => {
    renderRuns(ME_RESEARCHER, true);
    expect((await screen.findByTestId('runs-empty')).textContent).toContain('No runs yet.');
  });

  it('shows the server error message', async () => {
    stubFetch(
      on('GET', '/api/v1/me', () => json(200, ME_RESEARCHER)),
      on('GET', '/api/v1/runs', () => json(503, { error: { code: 'database_unavailable', message: 'the database is not answering' } })),
    );
    renderRoutes([{ path: '/runs', element: <RunsPage /> }], '/runs');
    expect((await screen.findByRole('alert')).textContent).toContain('the database is not answering');
  });

  it('asks visitors to sign in', async () => {
    const { sent } = renderRuns(ME_VISITOR);
    expect(await screen.findByRole('link', { name: 'Sign in' })).toBeTruthy();
    expect(listRequests(sent)).toHaveLength(0);
  });
});
