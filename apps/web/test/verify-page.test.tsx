import type { MeResponse } from '@cairn/schema';
import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { parseLabelCsv, parseLabelText } from '../src/components/verify/parse-labels';
import { VerifyPage } from '../src/pages/VerifyPage';
import { json, ME_RESEARCHER as me, on, renderRoutes, stubFetch } from './support/render-page';

/** /api/v1/me and /api/v1/graphs answer as a researcher with no uploads; POST /api/v1/verify answers `verdict`. */
function stubApi(verdict: { status: number; body: unknown }, user: MeResponse = me) {
  return stubFetch(
    on('GET', '/api/v1/me', () => json(200, user)),
    on('GET', '/api/v1/graphs', () => json(200, { items: [], total: 0, limit: 100, offset: 0 })),
    on('POST', '/api/v1/verify', () => json(verdict.status, verdict.body)),
  );
}

async function renderPage() {
  renderRoutes([{ path: '/verify', element: <VerifyPage /> }], '/verify');
  // The form appears once the session is known.
  await screen.findByText(/Verify a labelling|Your role does not allow/);
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const type = (label: string | RegExp, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
const submit = () => fireEvent.click(screen.getByRole('button', { name: 'Check the labelling' }));

describe('VerifyPage', () => {
  it('sends the parsed labels and draws the violating path on the grid', async () => {
    // The 2 x 3 grid 0 1 2 / 3 4 5 labelled 1 2 1 / 2 1 2: vertices 1 and 3 both carry 2 and the path
    // 1-0-3 between them only passes label 1, so this is not a ranking (checked by hand).
    const calls = stubApi({
      status: 200,
      body: { valid: false, labelCount: 2, maxLabel: 2, vertexCount: 6, violation: { label: 2, u: 1, v: 3, path: [1, 0, 3], message: 'vertices 1 and 3 both have label 2' } },
    });
    await renderPage();
    type('Spec or mask', 'grid:2x3');
    expect(await screen.findByText('Read as the 2 × 3 grid (6 vertices).')).toBeTruthy();
    type('Labels', '1 2 1\n2,1,2');
    submit();
    const summary = await screen.findByTestId('violation-summary');
    const post = calls.find((c) => c.method === 'POST')!;
    expect(post.url).toBe('/api/v1/verify');
    expect(post.body).toEqual({ spec: 'grid:2x3', labels: [1, 2, 1, 2, 1, 2] });
    expect(summary.textContent).toContain('row 1, column 2 and row 2, column 1 both have label 2');
    const picture = screen.getByTestId('ranking-picture');
    const stroke = (v: number) => picture.querySelector(`[data-vertex="${v}"] rect`)!.getAttribute('stroke');
    for (const v of [1, 0, 3]) expect(stroke(v)).toBe('#b23a2e');
    for (const v of [2, 4, 5]) expect(stroke(v)).toBe('none');
    expect(screen.getByRole('heading', { name: 'Not a ranking' })).toBeTruthy();
  });

  it('refuses labels of the wrong length beside the labels, before asking the server', async () => {
    const calls = stubApi({ status: 200, body: {} });
    await renderPage();
    type('Spec or mask', 'grid:2x3');
    type('Labels', '1 2 3');
    submit();
    expect(await screen.findByText('3 labels for 6 vertices: give exactly one label per vertex')).toBeTruthy();
    expect(screen.getByLabelText('Labels').getAttribute('aria-invalid')).toBe('true');
    type('Labels', '1 2 x');
    submit();
    expect(await screen.findByText('item 3 ("x") is not a whole number')).toBeTruthy();
    type('Spec or mask', 'torus:2x5');
    submit();
    // The shared GraphSpec rule, in its own words.
    expect(await screen.findByText('torus:2x5: rows must be at least 3')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it("puts the server's body.labels problem next to the labels", async () => {
    stubApi({
      status: 400,
      body: { error: { code: 'invalid_request', message: 'body.labels: expected 6 labels, got 5', details: { problems: [{ field: 'body.labels', message: 'expected 6 labels, got 5' }] } } },
    });
    await renderPage();
    // A random tree's size is the server's to say, so the count is not checked here.
    type('Spec or mask', 'random-tree:6:3');
    type('Labels', '1 2 1 3 1');
    submit();
    const msg = await screen.findByText('expected 6 labels, got 5');
    expect(msg.id).toBe('verify-labelsText-error');
  });

  it('reads a vertex,label CSV file and draws a valid ranking of a mask', async () => {
    const calls = stubApi({ status: 200, body: { valid: true, labelCount: 2, maxLabel: 2, vertexCount: 3 } });
    await renderPage();
    // The mask #.## has cells at columns 1, 3 and 4: vertices 0, 1, 2.
    type('Spec or mask', '#.##');
    expect(await screen.findByText('Read as a 1 × 4 mask with 3 cells.')).toBeTruthy();
    const file = new File(['vertex,label\n2,1\n0,1\n1,2\n'], 'plan.csv', { type: 'text/csv' });
    fireEvent.change(screen.getByLabelText('Read a CSV file (vertex,label)'), { target: { files: [file] } });
    expect((await screen.findByTestId('file-labels')).textContent).toBe('3 labels read from plan.csv');
    submit();
    expect(await screen.findByRole('heading', { name: 'A ranking' })).toBeTruthy();
    expect(calls.find((c) => c.method === 'POST')!.body).toEqual({ spec: { family: 'mask', text: '#.##' }, labels: [1, 2, 1] });
    expect(screen.getByTestId('ranking-picture').querySelectorAll('[data-vertex]')).toHaveLength(3);
  });

  it('tells a viewer the page needs a researcher', async () => {
    stubApi({ status: 200, body: {} }, { ...me, user: { ...me.user!, role: 'viewer' }, permissions: ['runs:read', 'atlas:read'] });
    await renderPage();
    expect(await screen.findByText(/Your role does not allow verifying labellings/)).toBeTruthy();
    await waitFor(() => expect(screen.queryByLabelText('Labels')).toBeNull());
  });
});

describe('label parsing', () => {
  it('reads lists and grid rows alike, and skips mask holes only when asked', () => {
    expect(parseLabelText('1, 2;3\n4\t5')).toEqual({ ok: true, labels: [1, 2, 3, 4, 5] });
    expect(parseLabelText('1 . 2', { holes: true })).toEqual({ ok: true, labels: [1, 2] });
    expect(parseLabelText('1 . 2')).toEqual({ ok: false, message: 'item 2 (".") is not a whole number' });
    expect(parseLabelText('1 0')).toEqual({ ok: false, message: 'item 2 is 0; labels start at 1' });
  });

  it('reads vertex,label files in any order and names a missing vertex', () => {
    expect(parseLabelCsv('vertex,label\n1,3\n0,2\n')).toEqual({ ok: true, labels: [2, 3] });
    expect(parseLabelCsv('0,1\n2,1\n')).toEqual({ ok: false, message: 'vertex 1 has no label (vertices are numbered from 0, with none missing)' });
    expect(parseLabelCsv('0,1\n0,2\n')).toEqual({ ok: false, message: 'line 2: vertex 0 is labelled twice' });
    expect(parseLabelCsv('label\n1\n2\n')).toEqual({ ok: true, labels: [1, 2] });
  });
});
