import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { useParams } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { SweepForm } from '../src/components/sweep/SweepForm';
import { always, json, renderRoutes, stubFetch } from './support/render-page';

const SWEEP_ID = '5b0c1d2e-3f40-4a51-8b62-7c8d9e0f1a2b';

/** Stubs fetch: every request (the form sends only POST /api/v1/sweeps) answers `answer` (status, body); every call is recorded. */
const stubPost = (status: number, answer: unknown) => stubFetch(always(() => json(status, answer)));

function SweepLanding() {
  return <p>opened sweep {useParams().id}</p>;
}

function renderForm() {
  return renderRoutes(
    [
      { path: '/sweeps', element: <SweepForm /> },
      { path: '/sweeps/:id', element: <SweepLanding /> },
    ],
    '/sweeps',
  ).router;
}

const setNumber = (label: string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('SweepForm', () => {
  it('counts the cells and the runs behind them as the ranges change', async () => {
    stubPost(201, {});
    renderForm();
    const count = screen.getByTestId('sweep-cell-count');
    // Default 1..6 x 1..12 grid: 72 cells; a cell (r, c) with r > c shares the run of (c, r), and every
    // such mirror lies inside the ranges here, so the runs are the cells with r <= c: 12+11+10+9+8+7 = 57.
    expect(count.textContent).toContain('72 cells, computed by 57 runs');
    setNumber('Rows to', '3');
    setNumber('Columns from', '4');
    setNumber('Columns to', '8');
    await waitFor(() => expect(count.textContent).toMatch(/^15 cells · at most 400/));
    // Cylinders are not symmetric: no sharing.
    fireEvent.change(screen.getByLabelText('Family'), { target: { value: 'cylinder' } });
    await waitFor(() => expect(count.textContent).toBe('15 cells · at most 400'));
  });

  it('refuses more than MAX_SWEEP_CELLS beside the ranges and sends nothing', async () => {
    const calls = stubPost(201, { sweep: { id: SWEEP_ID } });
    renderForm();
    setNumber('Rows to', '30');
    setNumber('Columns to', '30');
    const count = screen.getByTestId('sweep-cell-count');
    await waitFor(() => expect(count.textContent).toContain('900 cells is more than the 400 one sweep may make'));
    expect(count.getAttribute('role')).toBe('alert');
    fireEvent.click(screen.getByRole('button', { name: 'Start sweep' }));
    // The resolver's refusal lands in the same place; nothing reaches the server.
    await waitFor(() => expect(count.textContent).toContain('narrow a range'));
    await new Promise((r) => setTimeout(r, 20));
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('says a range that runs backwards is wrong, next to its field', async () => {
    const calls = stubPost(201, {});
    renderForm();
    setNumber('Rows from', '9');
    setNumber('Rows to', '4');
    fireEvent.click(screen.getByRole('button', { name: 'Start sweep' }));
    expect(await screen.findByText('rows.from must not exceed rows.to')).toBeTruthy();
    expect(screen.getByLabelText('Rows to').getAttribute('aria-invalid')).toBe('true');
    expect(calls).toHaveLength(0);
  });

  it('posts the parsed request and opens the new sweep', async () => {
    const calls = stubPost(201, { sweep: { id: SWEEP_ID }, cells: [] });
    const router = renderForm();
    fireEvent.change(screen.getByLabelText('Family'), { target: { value: 'torus' } });
    setNumber('Rows from', '3');
    setNumber('Rows to', '5');
    setNumber('Columns from', '3');
    setNumber('Columns to', '9');
    fireEvent.change(screen.getByLabelText('Method'), { target: { value: 'exact' } });
    setNumber('Time limit per run (seconds)', '120');
    fireEvent.change(screen.getByLabelText('Who may see it'), { target: { value: 'public' } });
    fireEvent.click(screen.getByRole('button', { name: 'Start sweep' }));
    expect(await screen.findByText(`opened sweep ${SWEEP_ID}`)).toBeTruthy();
    expect(router.state.location.pathname).toBe(`/sweeps/${SWEEP_ID}`);
    const post = calls.find((c) => c.method === 'POST')!;
    expect(post.url).toBe('/api/v1/sweeps');
    // The empty name is left out rather than sent as "" (which the schema refuses).
    expect(post.body).toEqual({ family: 'torus', rows: { from: 3, to: 5 }, cols: { from: 3, to: 9 }, method: 'exact', timeLimitSeconds: 120, visibility: 'public' });
  });

  it("shows the server's field problems beside the fields they name", async () => {
    stubPost(400, {
      error: { code: 'invalid_request', message: 'body.rows.from: a torus needs at least 3 rows', details: { problems: [{ field: 'body.rows.from', message: 'a torus needs at least 3 rows' }] } },
    });
    renderForm();
    fireEvent.change(screen.getByLabelText('Family'), { target: { value: 'torus' } });
    fireEvent.click(screen.getByRole('button', { name: 'Start sweep' }));
    const msg = await screen.findByText('a torus needs at least 3 rows');
    expect(msg.id).toBe('sweep-rows-from-error');
    expect(screen.getByLabelText('Rows from').getAttribute('aria-describedby')).toBe('sweep-rows-from-error');
  });
});
