import type { SweepCell, SweepView } from '@cairn/schema';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { sweepChartData } from '../src/components/sweep/chart-data';
import { SweepTable } from '../src/components/sweep/SweepTable';
import { SweepPage } from '../src/pages/SweepPage';
import { always, json, renderRoutes, renderWithRouter, stubFetch, uuid as run } from './support/render-page';

const SWEEP_ID = '5b0c1d2e-3f40-4a51-8b62-7c8d9e0f1a2b';

const cell = (rows: number, cols: number, over: Partial<SweepCell>): SweepCell => ({
  rows,
  cols,
  runId: null,
  status: null,
  rankNumber: null,
  lower: null,
  upper: null,
  provenance: null,
  mirrorOf: null,
  closedForm: null,
  ...over,
});

// Invented demo cells of a 2..3 x 2..4 grid sweep: the values are made up for the table, not results.
const cells: SweepCell[] = [
  cell(2, 2, { runId: run(1), status: 'done', rankNumber: 3, lower: 3, upper: 3, provenance: 'formula:grid-2xn', closedForm: { value: 3, id: 'grid-2xn' } }),
  cell(2, 3, { runId: run(2), status: 'done', rankNumber: 3, lower: 3, upper: 3, provenance: 'formula:grid-2xn', closedForm: { value: 3, id: 'grid-2xn' } }),
  cell(2, 4, { runId: run(3), status: 'done', rankNumber: null, lower: 3, upper: 4, provenance: 'bound', closedForm: { value: 4, id: 'grid-2xn' } }),
  cell(3, 2, { runId: run(2), status: 'done', rankNumber: 3, lower: 3, upper: 3, provenance: 'formula:grid-2xn', mirrorOf: { rows: 2, cols: 3 } }),
  cell(3, 3, { runId: run(4), status: 'running', lower: 3, upper: 5 }),
  cell(3, 4, { runId: run(5), status: 'queued' }),
];

const summary = (counts: Partial<SweepView['sweep']['counts']>): SweepView['sweep'] => ({
  id: SWEEP_ID,
  name: 'Seminar grid table',
  family: 'grid',
  rows: { from: 2, to: 3 },
  cols: { from: 2, to: 4 },
  method: 'auto',
  timeLimitSeconds: 60,
  visibility: 'private',
  owner: { id: run(99), login: 'ada' },
  createdAt: '2026-01-05T10:00:00.000Z',
  cellCount: 6,
  runCount: 5,
  mirrorCells: 'shared',
  counts: { queued: 0, running: 0, done: 0, failed: 0, cancelled: 0, ...counts },
});

const view: SweepView = { sweep: summary({ done: 3, running: 1, queued: 1 }), cells };

const renderSweep = () => renderRoutes([{ path: '/sweeps/:id', element: <SweepPage /> }], `/sweeps/${SWEEP_ID}`);

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('SweepTable', () => {
  it('lays the cells out rows by columns with values, intervals and states', () => {
    renderWithRouter(<SweepTable view={view} />);
    const table = screen.getByTestId('sweep-table');
    const bodyRows = within(table).getAllByRole('row').slice(1);
    expect(bodyRows.map((r) => within(r).getByRole('rowheader').textContent)).toEqual(['2', '3']);
    expect(screen.getByTestId('sweep-cell-2x2').textContent).toBe('3');
    expect(screen.getByTestId('sweep-cell-2x4').textContent).toBe('[3, 4]');
    expect(screen.getByTestId('sweep-cell-3x4').textContent).toBe('queued');
    expect(screen.getByTestId('sweep-cell-3x4').getAttribute('data-state')).toBe('queued');
    // A running cell shows the interval it has reached so far.
    expect(screen.getByTestId('sweep-cell-3x3').textContent).toBe('[3, 5]');
    expect(screen.getByTestId('sweep-cell-3x3').getAttribute('data-state')).toBe('running');
  });

  it('marks mirror cells and links every cell with a run to it', () => {
    renderWithRouter(<SweepTable view={view} />);
    const mirror = screen.getByTestId('sweep-cell-3x2');
    expect(mirror.getAttribute('data-mirror')).toBe('2x3');
    expect(mirror.textContent).toContain('⇄');
    const link = within(mirror).getByRole('link');
    expect(link.getAttribute('href')).toBe(`/runs/${run(2)}`);
    expect(link.getAttribute('aria-label')).toBe('3 × 2: rank number 3, by formula:grid-2xn, mirror of 2 × 3');
    expect(screen.getByTestId('sweep-cell-2x3').getAttribute('data-mirror')).toBeNull();
    expect(screen.getByTestId('sweep-cell-2x2').getAttribute('data-formula')).toBe('true');
    expect(screen.getByTestId('sweep-cell-2x4').getAttribute('data-formula')).toBeNull();
  });
});

describe('sweepChartData', () => {
  it('gives one series per row count against the columns, flagging closed forms', () => {
    const data = sweepChartData(view);
    expect(data.rowCounts).toEqual([2, 3]);
    expect(data.points.map((p) => p.cols)).toEqual([2, 3, 4]);
    const at4 = data.points.find((p) => p.cols === 4)!;
    expect([at4.l2, at4.u2, at4.f2]).toEqual([3, 4, false]);
    const at3 = data.points.find((p) => p.cols === 3)!;
    expect([at3.l2, at3.u2, at3.f2]).toEqual([3, 3, true]);
    expect(data.formulaCells).toBe(3);
  });

  it('draws a closed-form curve only for row counts with closed forms, through their values', () => {
    const data = sweepChartData(view);
    expect(data.curveRows).toEqual([2]);
    expect(data.points.map((p) => p.c2)).toEqual([3, 3, 4]);
    expect(data.points.map((p) => p.c3)).toEqual([null, null, null]);
  });
});

describe('SweepPage', () => {
  it('asks again while cells are queued or running, and stops once all are done', async () => {
    const done: SweepView = {
      sweep: summary({ done: 5 }),
      cells: cells.map((c) => (c.status === 'done' ? c : { ...c, status: 'done', rankNumber: 4, lower: 4, upper: 4, provenance: 'exact-search' })),
    };
    let gets = 0;
    stubFetch(
      always((url) => {
        if (url.pathname !== `/api/v1/sweeps/${SWEEP_ID}`) return json(404, {});
        gets++;
        return json(200, gets === 1 ? view : done);
      }),
    );
    renderSweep();
    expect(await screen.findByText('Seminar grid table')).toBeTruthy();
    expect(screen.getByTestId('sweep-cell-3x4').textContent).toBe('queued');
    expect(screen.getByRole('link', { name: 'Download CSV' }).getAttribute('href')).toBe(`/api/v1/sweeps/${SWEEP_ID}/export?format=csv`);
    // The 2 s poll brings the finished cells in.
    await waitFor(() => expect(screen.getByTestId('sweep-cell-3x4').textContent).toBe('4'), { timeout: 4000 });
    expect(screen.getByText('Every run has finished.')).toBeTruthy();
    await new Promise((r) => setTimeout(r, 2300));
    expect(gets).toBe(2);
  }, 10_000);

  it("shows the server's message when the sweep cannot be read", async () => {
    stubFetch(always(() => json(404, { error: { code: 'not_found', message: 'no sweep 5b0c1d2e' } })));
    renderSweep();
    expect((await screen.findByRole('alert')).textContent).toBe('Could not load this sweep: no sweep 5b0c1d2e');
  });
});
