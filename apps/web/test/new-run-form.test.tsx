import type { UploadResult } from '@cairn/schema';
import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { NewRunPage } from '../src/pages/NewRunPage';
import { RUN_ID, runView } from './run-fixtures';
import { ME_RESEARCHER, ME_VISITOR, json, on, renderRoutes, stubFetch, type Route, type SentRequest } from './support/render-page';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const me = on('GET', '/api/v1/me', () => json(200, ME_RESEARCHER));
const created = on('POST', '/api/v1/runs', () => json(202, runView({ status: 'queued', result: null })));

function renderForm(...routes: Route[]) {
  const sent = stubFetch(me, ...routes);
  const utils = renderRoutes(
    [
      { path: '/runs/new', element: <NewRunPage /> },
      { path: '/runs/:id', element: <p>run page</p> },
    ],
    '/runs/new',
  );
  return { sent, ...utils };
}

/** The message a field points to with aria-describedby. */
function messageBeside(field: HTMLElement): string {
  const ids = (field.getAttribute('aria-describedby') ?? '').split(' ').filter(Boolean);
  return ids.map((id) => document.getElementById(id)?.textContent ?? '').join(' ');
}

const posts = (sent: SentRequest[]) => sent.filter((r) => r.method === 'POST' && r.url === '/api/v1/runs');

describe('the new-run form', () => {
  it('refuses sizes outside the shared limits beside the field, and sends nothing', async () => {
    const { sent } = renderForm(created);
    const rows = await screen.findByLabelText('Rows');
    fireEvent.change(rows, { target: { value: '0' } });
    fireEvent.click(screen.getByRole('button', { name: 'Start the run' }));
    await waitFor(() => expect(messageBeside(screen.getByLabelText('Rows'))).toBe('rows must be at least 1'));
    expect(screen.getByLabelText('Rows').getAttribute('aria-invalid')).toBe('true');
    expect(posts(sent)).toHaveLength(0);
  });

  it('applies each family its own minimum (a torus needs 3 rows) and the time limit its maximum', async () => {
    const { sent } = renderForm(created);
    fireEvent.change(await screen.findByLabelText('Family'), { target: { value: 'torus' } });
    fireEvent.change(screen.getByLabelText('Rows'), { target: { value: '2' } });
    fireEvent.change(screen.getByLabelText('Time limit (seconds)'), { target: { value: '4000' } });
    fireEvent.click(screen.getByRole('button', { name: 'Start the run' }));
    await waitFor(() => expect(messageBeside(screen.getByLabelText('Rows'))).toBe('rows must be at least 3'));
    expect(messageBeside(screen.getByLabelText('Time limit (seconds)'))).toContain('timeLimitSeconds may be at most 3600');
    expect(posts(sent)).toHaveLength(0);
  });

  it('says an emptied size must be a number', async () => {
    renderForm(created);
    fireEvent.change(await screen.findByLabelText('Columns'), { target: { value: '' } });
    fireEvent.click(screen.getByRole('button', { name: 'Start the run' }));
    await waitFor(() => expect(messageBeside(screen.getByLabelText('Columns'))).toBe('cols must be a number'));
  });

  it('sends the spec object, method, limit and visibility, then opens the run', async () => {
    const { sent, router } = renderForm(created);
    fireEvent.change(await screen.findByLabelText('Rows'), { target: { value: '5' } });
    fireEvent.change(screen.getByLabelText('Columns'), { target: { value: '11' } });
    fireEvent.click(screen.getByRole('radio', { name: /Exact search/ }));
    fireEvent.change(screen.getByLabelText('Time limit (seconds)'), { target: { value: '120' } });
    fireEvent.change(screen.getByLabelText('Who sees it'), { target: { value: 'link' } });
    fireEvent.click(screen.getByRole('button', { name: 'Start the run' }));
    await waitFor(() => expect(router.state.location.pathname).toBe(`/runs/${RUN_ID}`));
    expect(posts(sent)[0]!.body).toEqual({ spec: { family: 'grid', rows: 5, cols: 11 }, method: 'exact', timeLimitSeconds: 120, visibility: 'link' });
  });

  it('sends the seed and probability of G(n, p)', async () => {
    const { sent, router } = renderForm(created);
    fireEvent.change(await screen.findByLabelText('Family'), { target: { value: 'gnp' } });
    fireEvent.change(screen.getByLabelText('Vertices n'), { target: { value: '40' } });
    fireEvent.change(screen.getByLabelText('Edge probability p'), { target: { value: '0.25' } });
    fireEvent.change(screen.getByLabelText('Seed'), { target: { value: '7' } });
    fireEvent.click(screen.getByRole('button', { name: 'Start the run' }));
    await waitFor(() => expect(router.state.location.pathname).toBe(`/runs/${RUN_ID}`));
    expect(posts(sent)[0]!.body).toMatchObject({ spec: { family: 'gnp', n: 40, p: 0.25, seed: 7 } });
  });

  it('shows the server field problems beside the fields they name', async () => {
    const refused = on('POST', '/api/v1/runs', () =>
      json(413, {
        error: {
          code: 'graph_too_large',
          message: 'body.spec.cols: too many columns for a run',
          details: { problems: [{ field: 'body.spec.cols', message: 'too many columns for a run' }, { field: 'body.spec', message: 'use the cairn CLI for larger ones' }] },
        },
      }),
    );
    const { router } = renderForm(refused);
    fireEvent.click(await screen.findByRole('button', { name: 'Start the run' }));
    await waitFor(() => expect(messageBeside(screen.getByLabelText('Columns'))).toBe('too many columns for a run'));
    expect(screen.getByText('use the cairn CLI for larger ones')).toBeTruthy();
    expect(router.state.location.pathname).toBe('/runs/new');
  });

  it('sends a drawn mask as { family: mask, text }', async () => {
    const { sent, router } = renderForm(created);
    fireEvent.change(await screen.findByLabelText('Family'), { target: { value: 'mask' } });
    // The default shape's first row is full; remove its first cell.
    fireEvent.click(screen.getByRole('button', { name: 'row 1, column 1: cell' }));
    fireEvent.click(screen.getByRole('button', { name: 'Start the run' }));
    await waitFor(() => expect(router.state.location.pathname).toBe(`/runs/${RUN_ID}`));
    expect(posts(sent)[0]!.body).toMatchObject({ spec: { family: 'mask', text: '.#####\n######\n##....\n##..##\n' } });
  });

  it('runs an uploaded graph by its graphId', async () => {
    const graphId = '44444444-4444-4444-8444-444444444444';
    const upload: UploadResult = {
      graph: {
        id: graphId,
        name: 'cabinet-joints.txt',
        format: 'edge-list',
        sha256: 'a'.repeat(64),
        vertexCount: 12,
        edgeCount: 17,
        sizeBytes: 90,
        owner: { id: ME_RESEARCHER.user!.id, login: 'ada' },
        createdAt: '2025-03-01T10:00:00.000Z',
      },
      created: true,
      warnings: [],
      warningCount: 0,
    };
    const { sent, router } = renderForm(created, on('POST', '/api/v1/graphs', () => json(201, upload)));
    fireEvent.change(await screen.findByLabelText('Family'), { target: { value: 'upload' } });
    // Without a file the form says so beside the upload.
    fireEvent.click(screen.getByRole('button', { name: 'Start the run' }));
    expect(await screen.findByText('upload a graph file first')).toBeTruthy();
    fireEvent.change(screen.getByLabelText('Choose a graph file'), { target: { files: [new File(['0 1\n1 2\n'], 'cabinet-joints.txt', { type: 'text/plain' })] } });
    expect((await screen.findByTestId('chosen-graph')).textContent).toContain('cabinet-joints.txt');
    fireEvent.click(screen.getByRole('button', { name: 'Start the run' }));
    await waitFor(() => expect(router.state.location.pathname).toBe(`/runs/${RUN_ID}`));
    expect(posts(sent)[0]!.body).toEqual({ graphId, method: 'auto', timeLimitSeconds: 60, visibility: 'private' });
  });

  it('asks visitors to sign in instead of showing the form', async () => {
    stubFetch(on('GET', '/api/v1/me', () => json(200, ME_VISITOR)));
    renderRoutes([{ path: '/runs/new', element: <NewRunPage /> }], '/runs/new');
    expect((await screen.findByRole('link', { name: 'Sign in' })).getAttribute('href')).toBe('/api/v1/auth/github?next=%2Fruns%2Fnew');
    expect(screen.queryByRole('button', { name: 'Start the run' })).toBeNull();
  });
});
