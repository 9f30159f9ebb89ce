import { cleanup, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { familyGraph, parseGraphFile, placeVertices } from '../src/components/node-link/graph-data';
import { RunDrawing } from '../src/components/run/RunDrawing';
import { GRID_RESULT, runView } from './run-fixtures';
import { on, renderWithClient, stubFetch } from './support/render-page';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const edgesOf = (text: string, format: string) => {
  const read = parseGraphFile(text, format);
  if (!read.ok) throw new Error(read.reason);
  return { n: read.graph.vertexCount, edges: Array.from(read.graph.edges) };
};

describe('reading uploaded files again for drawing', () => {
  it('reads a 1-based edge list (no 0 appears), dropping loops and repeats', () => {
    expect(edgesOf('# cabinet joints\n1 2\n2 3 % glued\n3 3\n3 2\n', 'edge-list')).toEqual({ n: 3, edges: [0, 1, 1, 2] });
  });

  it('reads the header n m of an edge list when exactly m edges follow', () => {
    expect(edgesOf('5 2\n0 1\n3 4\n', 'edge-list')).toEqual({ n: 5, edges: [0, 1, 3, 4] });
    // "4 3" could be an edge; exactly 3 edge lines follow and every id fits in 4 vertices, so it is the header.
    expect(edgesOf('4 3\n0 1\n1 2\n2 3\n', 'edge-list').n).toBe(4);
  });

  it('reads DIMACS, Matrix Market and Cairn JSON', () => {
    expect(edgesOf('c panel\np edge 3 2\ne 1 2\ne 2 3\n', 'dimacs')).toEqual({ n: 3, edges: [0, 1, 1, 2] });
    expect(edgesOf('p tw 3 1\n1 3\n', 'dimacs')).toEqual({ n: 3, edges: [0, 2] });
    expect(edgesOf('%%MatrixMarket matrix coordinate pattern symmetric\n% a comment\n3 3 3\n2 1\n3 2\n3 3\n', 'matrix-market')).toEqual({ n: 3, edges: [0, 1, 1, 2] });
    expect(edgesOf('{"vertexCount": 4, "edges": [[0, 1], [2, 3]]}', 'json')).toEqual({ n: 4, edges: [0, 1, 2, 3] });
  });
});

describe('graphs known by their family', () => {
  it('builds the classic families in the engine numbering', () => {
    const star = familyGraph({ kind: 'star', leaves: 3 }, null);
    expect(star?.ok && Array.from(star.graph.edges)).toEqual([0, 1, 0, 2, 0, 3]);
    const kab = familyGraph(null, { family: 'bipartite', a: 2, b: 1 });
    expect(kab?.ok && Array.from(kab.graph.edges)).toEqual([0, 2, 1, 2]);
    expect(familyGraph({ kind: 'randomGraph', n: 10, p: 0.5, seed: 1 }, { family: 'gnp' })).toBeNull();
  });

  it('refuses to draw more than the limit', () => {
    expect(familyGraph({ kind: 'complete', n: 1000 }, null)).toMatchObject({ ok: false, reason: expect.stringContaining('edges') });
  });

  it('lays out the same graph the same way every time, inside the unit box', () => {
    const g = familyGraph(null, { family: 'tree', parents: [-1, 0, 0, 1, 1, 2] });
    if (!g?.ok) throw new Error('no tree');
    const a = placeVertices(g.graph);
    const b = placeVertices(g.graph);
    expect(Array.from(a.xs)).toEqual(Array.from(b.xs));
    for (const x of [...a.xs, ...a.ys]) expect(x).toBeGreaterThanOrEqual(0), expect(x).toBeLessThanOrEqual(1);
  });
});

describe('RunDrawing of an uploaded graph', () => {
  const graphId = '44444444-4444-4444-8444-444444444444';
  const upload = (vertexCount: number, edgeCount: number) =>
    runView({
      spec: { family: 'upload', graphId, name: 'frame.el' },
      specText: 'upload:frame.el',
      result: { ...GRID_RESULT, graph: { vertexCount, edgeCount, family: { kind: 'file', format: 'edge-list', name: 'frame.el' } }, labels: [1, 2, 1, 3].slice(0, vertexCount) },
    });

  it('draws the stored file when it reads back to the same graph', async () => {
    stubFetch(on('GET', `/api/v1/graphs/${graphId}/content`, () => new Response('0 1\n1 2\n2 3\n', { status: 200 })));
    const run = upload(4, 3);
    renderWithClient(<RunDrawing run={run} result={run.result!} plan={undefined} exportBase="/x" mayReadGraph />);
    expect((await screen.findByTestId('node-link')).querySelectorAll('[data-vertex]')).toHaveLength(4);
  });

  it('falls back to the server drawing rather than draw a graph read differently', async () => {
    stubFetch(on('GET', `/api/v1/graphs/${graphId}/content`, () => new Response('0 1\n1 2\n', { status: 200 })));
    const run = upload(4, 3);
    renderWithClient(<RunDrawing run={run} result={run.result!} plan={undefined} exportBase="/api/v1/runs/r/export" mayReadGraph />);
    expect((await screen.findByTestId('server-drawing')).getAttribute('src')).toBe('/api/v1/runs/r/export?format=svg');
    expect(screen.queryByTestId('node-link')).toBeNull();
  });
});
