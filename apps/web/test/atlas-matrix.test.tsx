import type { AtlasEntryView, AtlasList } from '@cairn/schema';
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AtlasMatrix } from '../src/components/atlas/AtlasMatrix';
import { AtlasPage } from '../src/pages/AtlasPage';
import { always, json, renderRoutes, renderWithRouter, stubFetch, uuid as id } from './support/render-page';

// Invented atlas rows for the drawing; the numbers are not claims about these grids.
const entry = (rows: number, cols: number, lower: number, upper: number, over: Partial<AtlasEntryView> = {}): AtlasEntryView => ({
  graphKey: `grid:${rows}x${cols}`,
  family: 'grid',
  sizes: { rows, cols },
  vertexCount: rows * cols,
  edgeCount: rows * (cols - 1) + cols * (rows - 1),
  lower,
  upper,
  exact: lower === upper,
  rankNumber: lower === upper ? lower : null,
  lowerProvenance: { argument: 'contains a long path', source: 'path bound' },
  upperProvenance: { construction: 'midline split', argument: 'certificate verified' },
  lowerRunId: id(rows * 100 + cols),
  upperRunId: id(rows * 100 + cols + 50),
  updatedAt: '2026-01-05T10:00:00.000Z',
  ...over,
});

const entries = [
  entry(1, 3, 2, 2, { upperProvenance: { construction: 'formula:path', argument: 'closed form' } }),
  entry(2, 3, 3, 3, { lowerRunId: id(7), upperRunId: id(7) }),
  entry(2, 4, 3, 4),
  entry(3, 4, 3, 5, { upperRunId: null }),
  entry(4, 4, 4, 7),
];

const renderMatrix = () => renderWithRouter(<AtlasMatrix family="grid" entries={entries} />);
const renderAtlas = (path: string) => renderRoutes([{ path: '/atlas', element: <AtlasPage /> }], path);
const cellAt = (r: number, c: number) => screen.getByTestId('atlas-matrix').querySelector<HTMLElement>(`[data-cell="${r}x${c}"]`)!;

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('AtlasMatrix', () => {
  it('shades exact, bounded (by gap) and unknown cells apart, the mirror too', () => {
    renderMatrix();
    // Square, since grids mirror: 4 x 4.
    expect(screen.getByTestId('atlas-matrix').querySelectorAll('[data-cell]')).toHaveLength(16);
    expect(cellAt(2, 3).dataset.shade).toBe('exact');
    expect(cellAt(2, 3).className).toContain('bg-slate-ink');
    expect(cellAt(2, 4).dataset.shade).toBe('gap1');
    expect(cellAt(3, 4).dataset.shade).toBe('gap2');
    expect(cellAt(4, 4).dataset.shade).toBe('gap3');
    expect(cellAt(1, 1).dataset.shade).toBe('unknown');
    expect(cellAt(1, 1).className).toContain('border-dashed');
    // The stored 2 x 4 shows at 4 x 2 as well, marked as a mirror.
    expect(cellAt(4, 2).dataset.shade).toBe('gap1');
    expect(cellAt(4, 2).dataset.mirror).toBe('true');
    expect(cellAt(2, 4).dataset.mirror).toBeUndefined();
    expect(cellAt(2, 4).textContent).toBe('3–4');
    expect(within(screen.getByTestId('shade-legend')).getByText('bounded, gap 2')).toBeTruthy();
  });

  it('links each known cell to its runs and leaves unknown cells unlinked', () => {
    renderMatrix();
    expect(cellAt(2, 3).tagName).toBe('A');
    expect(cellAt(2, 3).getAttribute('href')).toBe(`/runs/${id(7)}`);
    expect(cellAt(3, 2).getAttribute('href')).toBe(`/runs/${id(7)}`);
    // No upper run stored: the cell opens the lower bound's run.
    expect(cellAt(3, 4).getAttribute('href')).toBe(`/runs/${id(304)}`);
    expect(cellAt(1, 1).tagName).toBe('SPAN');
    // The detail panel names both sides with their own runs.
    fireEvent.mouseEnter(cellAt(2, 4));
    const detail = screen.getByTestId('atlas-cell-detail');
    expect(within(detail).getByRole('link', { name: 'run proving the lower bound' }).getAttribute('href')).toBe(`/runs/${id(204)}`);
    expect(within(detail).getByRole('link', { name: 'run with the certificate' }).getAttribute('href')).toBe(`/runs/${id(254)}`);
    expect(detail.textContent).toContain('midline split');
  });

  it('is one tab stop, moved through with the arrow keys', () => {
    renderMatrix();
    const tabbable = screen.getByTestId('atlas-matrix').querySelectorAll('[tabindex="0"]');
    expect(tabbable).toHaveLength(1);
    cellAt(1, 1).focus();
    fireEvent.keyDown(cellAt(1, 1), { key: 'ArrowRight' });
    fireEvent.keyDown(document.activeElement!, { key: 'ArrowRight' });
    expect(document.activeElement).toBe(cellAt(1, 3));
    fireEvent.keyDown(document.activeElement!, { key: 'ArrowDown' });
    expect(document.activeElement).toBe(cellAt(2, 3));
    expect(screen.getByTestId('atlas-cell-detail').textContent).toContain('rank number 3');
    fireEvent.keyDown(document.activeElement!, { key: 'End' });
    expect(document.activeElement).toBe(cellAt(2, 4));
  });
});

describe('AtlasPage table view', () => {
  it('sends the filters to GET /api/v1/atlas and pages by offset', async () => {
    const urls: URL[] = [];
    stubFetch(
      always((url) => {
        urls.push(url);
        const offset = Number(url.searchParams.get('offset'));
        const page: AtlasList = { entries: offset === 0 ? entries.slice(0, 3) : entries.slice(3), total: 28, nextOffset: offset === 0 ? 25 : null };
        return json(200, page);
      }),
    );
    renderAtlas('/atlas?family=torus&view=table');
    const table = await screen.findByTestId('atlas-table');
    expect(within(table).getAllByRole('row')).toHaveLength(4);
    expect(urls[0]!.searchParams.get('family')).toBe('torus');

    // A bad size is caught beside its field with the API's own rule.
    fireEvent.change(screen.getByLabelText('Rows'), { target: { value: '0' } });
    fireEvent.click(screen.getByRole('button', { name: 'Apply filters' }));
    expect(await screen.findByText('rows must be at least 1')).toBeTruthy();

    fireEvent.change(screen.getByLabelText('Rows'), { target: { value: '4' } });
    fireEvent.change(screen.getByLabelText('Known'), { target: { value: 'true' } });
    fireEvent.click(screen.getByRole('button', { name: 'Apply filters' }));
    await waitFor(() => expect(urls.at(-1)!.searchParams.get('rows')).toBe('4'));
    const filtered = urls.at(-1)!;
    expect(Object.fromEntries(filtered.searchParams)).toEqual({ family: 'torus', rows: '4', exact: 'true', limit: '25', offset: '0' });

    fireEvent.click(screen.getByRole('button', { name: 'Next' }));
    await waitFor(() => expect(urls.at(-1)!.searchParams.get('offset')).toBe('25'));
    expect(urls.at(-1)!.searchParams.get('rows')).toBe('4');
    expect(await screen.findByText('26–27 of 28')).toBeTruthy();
  });

  it('reads signed out and says when the family has nothing yet', async () => {
    stubFetch(always(() => json(200, { entries: [], total: 0, nextOffset: null })));
    renderAtlas('/atlas?family=cylinder');
    expect(await screen.findByText(/No cylinder values are in the atlas yet/)).toBeTruthy();
  });
});
