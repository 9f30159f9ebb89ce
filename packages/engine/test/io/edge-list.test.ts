import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readEdgeList, writeEdgeList } from '../../src/index';
import { arbitraryGraph, edgeList, parseErrorOf, placeOf } from './arbitraries';

describe('readEdgeList', () => {
  it('reads 0-based ids separated by spaces, tabs or commas, skipping comments and blank lines', () => {
    const text = '# a triangle and a pendant\n% also a comment\n\n0 1\n1\t2\n2,0\n2 , 3 # trailing comment\n';
    const { graph, warnings } = readEdgeList(text);
    expect(graph.vertexCount).toBe(4);
    expect(edgeList(graph)).toEqual([[0, 1], [0, 2], [1, 2], [2, 3]]);
    expect(warnings).toEqual([]);
    expect(graph.family).toEqual({ kind: 'file', format: 'edge-list' });
  });

  it('numbers from 1 under base auto exactly when the smallest id is 1', () => {
    expect(edgeList(readEdgeList('1 2\n2 3\n').graph)).toEqual([[0, 1], [1, 2]]);
    expect(readEdgeList('1 2\n2 3\n').graph.vertexCount).toBe(3);
    // a 0 appears: 0-based
    expect(readEdgeList('1 2\n0 3\n').graph.vertexCount).toBe(4);
    // the smallest id is 2: 0-based, vertices 0 and 1 have no edges
    expect(readEdgeList('2 3\n').graph.vertexCount).toBe(4);
  });

  it('follows an explicit base', () => {
    expect(edgeList(readEdgeList('1 2\n', { base: 0 }).graph)).toEqual([[1, 2]]);
    expect(readEdgeList('1 2\n', { base: 0 }).graph.vertexCount).toBe(3);
    expect(edgeList(readEdgeList('1 2\n', { base: 1 }).graph)).toEqual([[0, 1]]);
    expect(placeOf(() => readEdgeList('1 2\n2 0\n', { base: 1 }))).toEqual({ format: 'edge-list', line: 2, column: 3 });
  });

  it('takes a one-number first line as the vertex count', () => {
    const { graph } = readEdgeList('# header first\n6\n0 1\n');
    expect(graph.vertexCount).toBe(6);
    expect(edgeList(graph)).toEqual([[0, 1]]);
    expect(placeOf(() => readEdgeList('3\n0 1\n1 3\n', { base: 0 }))).toEqual({ format: 'edge-list', line: 3, column: 3 });
  });

  it('takes a two-number first line as the header "n m" when m edges follow within n vertices', () => {
    const { graph } = readEdgeList('5 2\n0 1\n1 2\n');
    expect(graph.vertexCount).toBe(5);
    expect(edgeList(graph)).toEqual([[0, 1], [1, 2]]);
    // 1-based under a header: ids 1..n
    expect(edgeList(readEdgeList('3 2\n1 2\n2 3\n').graph)).toEqual([[0, 1], [1, 2]]);
    // m disagrees: under 'auto' the line is an edge
    const asEdge = readEdgeList('5 3\n0 1\n1 2\n').graph;
    expect(edgeList(asEdge)).toEqual([[0, 1], [1, 2], [3, 5]]);
  });

  it('with header: true, a header whose m disagrees with the edge lines is an error naming its line', () => {
    const error = parseErrorOf(() => readEdgeList('5 3\n0 1\n1 2\n', { header: true }));
    expect({ line: error.line, column: error.column }).toEqual({ line: 1, column: 3 });
    expect(error.expected).toBe('3 edge lines, as the header "n m" says');
    expect(error.found).toBe('2');
    expect(placeOf(() => readEdgeList('4 1\n0 4\n', { header: true }))).toEqual({ format: 'edge-list', line: 2, column: 3 });
  });

  it('with header: false, every line is an edge', () => {
    expect(edgeList(readEdgeList('3 2\n0 1\n', { header: false, base: 0 }).graph)).toEqual([[0, 1], [2, 3]]);
    expect(placeOf(() => readEdgeList('3\n', { header: false }))).toEqual({ format: 'edge-list', line: 1, column: 2 });
  });

  it('drops self-loops and repeated edges (v u after u v too) with warnings at their lines', () => {
    const text = '0 1\n1 2\n2 2\n1 0\n0 1\n';
    const { graph, warnings, warningCount } = readEdgeList(text);
    expect(edgeList(graph)).toEqual([[0, 1], [1, 2]]);
    expect(warningCount).toBe(3);
    expect(warnings.map(({ kind, line, column }) => ({ kind, line, column }))).toEqual([
      { kind: 'self-loop', line: 3, column: 1 },
      { kind: 'duplicate-edge', line: 4, column: 1 },
      { kind: 'duplicate-edge', line: 5, column: 1 },
    ]);
    expect(warnings[1]!.message).toMatch(/line 1/);
  });

  it('lists at most 100 warnings and counts them all', () => {
    const text = '0 1\n'.repeat(251);
    const { graph, warnings, warningCount } = readEdgeList(text);
    expect(graph.edgeCount).toBe(1);
    expect(warnings).toHaveLength(100);
    expect(warningCount).toBe(250);
    expect(warnings[99]!.line).toBe(101);
  });

  it('reports bad lines with line, column, expected and found', () => {
    const error = parseErrorOf(() => readEdgeList('0 1\n1 x2\n'));
    expect([error.line, error.column, error.found]).toEqual([2, 3, '"x2"']);
    expect(placeOf(() => readEdgeList('0 1\n2\n'))).toEqual({ format: 'edge-list', line: 2, column: 2 });
    expect(placeOf(() => readEdgeList('0 1 7\n'))).toEqual({ format: 'edge-list', line: 1, column: 5 });
    expect(placeOf(() => readEdgeList('0 1\n  -1 2\n'))).toEqual({ format: 'edge-list', line: 2, column: 3 });
    expect(placeOf(() => readEdgeList('0,\n'))).toEqual({ format: 'edge-list', line: 1, column: 3 });
    expect(placeOf(() => readEdgeList('0 1.5\n'))).toEqual({ format: 'edge-list', line: 1, column: 3 });
    expect(placeOf(() => readEdgeList('0 1\n0 99999999999\n'))).toEqual({ format: 'edge-list', line: 2, column: 3 });
  });

  it('reads an empty text as the empty graph', () => {
    expect(readEdgeList('').graph.vertexCount).toBe(0);
    expect(readEdgeList('# nothing\n\n').graph.vertexCount).toBe(0);
  });
});

describe('writeEdgeList', () => {
  it('writes the header "n m" and one edge a line', () => {
    const graph = readEdgeList('4\n0 1\n1 2\n').graph;
    expect(writeEdgeList(graph)).toBe('4 2\n0 1\n1 2\n');
    expect(writeEdgeList(graph, { base: 1, header: false })).toBe('1 2\n2 3\n');
  });

  it('round-trips random graphs for both bases (1000 runs each)', () => {
    for (const base of [0, 1] as const) {
      fc.assert(
        fc.property(arbitraryGraph, (graph) => {
          const back = readEdgeList(writeEdgeList(graph, { base }), { base }).graph;
          expect(back.vertexCount).toBe(graph.vertexCount);
          expect(edgeList(back)).toEqual(edgeList(graph));
        }),
        { numRuns: 1000 },
      );
    }
  });

  it('round-trips under header: true and under auto header detection (1000 runs)', () => {
    fc.assert(
      fc.property(arbitraryGraph, fc.constantFrom(0 as const, 1 as const), fc.constantFrom(true, 'auto' as const), (graph, base, header) => {
        const back = readEdgeList(writeEdgeList(graph, { base, header: true }), { base, header }).graph;
        expect(back.vertexCount).toBe(graph.vertexCount);
        expect(edgeList(back)).toEqual(edgeList(graph));
      }),
      { numRuns: 1000 },
    );
  });

  it('without a header, keeps every edge and the vertices up to the largest id (1000 runs)', () => {
    fc.assert(
      fc.property(arbitraryGraph, (graph) => {
        const back = readEdgeList(writeEdgeList(graph, { header: false }), { base: 0 }).graph;
        expect(edgeList(back)).toEqual(edgeList(graph));
        const top = Math.max(-1, ...edgeList(graph).flat());
        expect(back.vertexCount).toBe(top + 1);
      }),
      { numRuns: 1000 },
    );
  });
});
