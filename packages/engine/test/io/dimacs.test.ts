import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readDimacs, writeDimacs } from '../../src/index';
import { arbitraryGraph, edgeList, fixture, parseErrorOf, placeOf } from './arbitraries';

// myciel3 as listed in the example of "Clique and Coloring Problems Graph Format" (DIMACS Challenge, 1993):
// the Mycielski graph on 11 vertices and 20 edges, 1-based in the file.
const MYCIEL3_EDGES = [
  [1, 2], [1, 4], [1, 7], [1, 9], [2, 3], [2, 6], [2, 8], [3, 5], [3, 7], [3, 10],
  [4, 5], [4, 6], [4, 10], [5, 8], [5, 9], [6, 11], [7, 11], [8, 11], [9, 11], [10, 11],
].map(([u, v]) => [u! - 1, v! - 1]);

describe('readDimacs', () => {
  it('reads the DIMACS example file (c, p edge, e lines)', () => {
    const { graph, warnings } = readDimacs(fixture('dimacs-myciel3.col'));
    expect(graph.vertexCount).toBe(11);
    expect(graph.edgeCount).toBe(20);
    expect(edgeList(graph)).toEqual(MYCIEL3_EDGES);
    expect(warnings).toEqual([]);
    expect(graph.family).toEqual({ kind: 'file', format: 'dimacs' });
  });

  it('reads the PACE "p tw" example (a path on five vertices; comments between edges)', () => {
    // PACE treewidth .gr format description, example from memory.
    const { graph } = readDimacs(fixture('pace-path5.gr'));
    expect(graph.vertexCount).toBe(5);
    expect(edgeList(graph)).toEqual([[0, 1], [1, 2], [2, 3], [3, 4]]);
  });

  it('accepts "p col" and node descriptors "n ID VALUE"', () => {
    const { graph } = readDimacs('p col 3 1\nn 1 5\ne 1 3\n');
    expect(edgeList(graph)).toEqual([[0, 2]]);
  });

  it('counts loops and repeats towards M and drops them with warnings', () => {
    const { graph, warnings } = readDimacs('p edge 3 3\ne 1 2\ne 2 1\ne 3 3\n');
    expect(edgeList(graph)).toEqual([[0, 1]]);
    expect(warnings.map((w) => [w.kind, w.line, w.column])).toEqual([
      ['duplicate-edge', 3, 3],
      ['self-loop', 4, 3],
    ]);
  });

  const myciel3 = fixture('dimacs-myciel3.col');
  const lines = myciel3.split('\n');
  const withLine = (index: number, text: string) => lines.map((l, i) => (i === index ? text : l)).join('\n');

  it('reports malformed variants of the example at the right line and column', () => {
    // the problem line is line 6, the edges lines 7..26
    const cases: [string, string, number, number][] = [
      ['missing problem line', myciel3.replace('p edge 11 20\n', ''), 6, 1],
      ['duplicate problem line', withLine(10, 'p edge 11 20'), 11, 1],
      ['edge before the problem line', `e 1 2\n${myciel3}`, 1, 1],
      ['vertex above N', withLine(8, 'e 1 12'), 9, 5],
      ['vertex 0', withLine(8, 'e 0 7'), 9, 3],
      ['not a number', withLine(8, 'e 1 seven'), 9, 5],
      ['truncated edge line', withLine(8, 'e 1'), 9, 4],
      ['too many fields', withLine(8, 'e 1 7 9'), 9, 7],
      ['unknown line type', withLine(8, 'x 1 7'), 9, 1],
      ['bare edge in a p edge file', withLine(8, '1 7'), 9, 1],
      ['unknown problem format', withLine(5, 'p graph 11 20'), 6, 3],
      ['problem line without M', withLine(5, 'p edge 11'), 6, 10],
      ['too many edges', `${myciel3}e 2 4\n`, 27, 1],
      ['too few edges (end of file, past "e 9 11")', myciel3.replace('e 10 11\n', ''), 25, 7],
    ];
    for (const [what, text, line, column] of cases) {
      expect({ what, ...placeOf(() => readDimacs(text)) }).toEqual({ what, format: 'dimacs', line, column });
    }
  });

  it('says what it expected and found', () => {
    const error = parseErrorOf(() => readDimacs(myciel3.replace('e 10 11\n', '')));
    expect(error.expected).toBe('20 edges, as the problem line on line 6 says');
    expect(error.found).toBe('19 (the file ends early)');
    expect(parseErrorOf(() => readDimacs(withLine(8, 'e 1 12'))).expected).toBe('a vertex number 1..11');
  });

  it('reports malformed "p tw" files', () => {
    const pace = fixture('pace-path5.gr');
    expect(placeOf(() => readDimacs(pace.replace('3 4', 'e 3 4')))).toEqual({ format: 'dimacs', line: 6, column: 1 });
    expect(placeOf(() => readDimacs(pace.replace('4 5', '4 6')))).toEqual({ format: 'dimacs', line: 7, column: 3 });
    expect(placeOf(() => readDimacs(pace.replace('p tw 5 4', 'p tw 5 5')))).toEqual({ format: 'dimacs', line: 7, column: 4 });
    expect(placeOf(() => readDimacs('c nothing else\n'))).toEqual({ format: 'dimacs', line: 1, column: 15 });
  });
});

describe('writeDimacs', () => {
  it('writes both variants', () => {
    const graph = readDimacs('p edge 3 2\ne 1 2\ne 2 3\n').graph;
    expect(writeDimacs(graph)).toBe('p edge 3 2\ne 1 2\ne 2 3\n');
    expect(writeDimacs(graph, { variant: 'tw' })).toBe('p tw 3 2\n1 2\n2 3\n');
  });

  it('round-trips random graphs in both variants (1000 runs each)', () => {
    for (const variant of ['edge', 'tw'] as const) {
      fc.assert(
        fc.property(arbitraryGraph, (graph) => {
          const back = readDimacs(writeDimacs(graph, { variant })).graph;
          expect(back.vertexCount).toBe(graph.vertexCount);
          expect(edgeList(back)).toEqual(edgeList(graph));
        }),
        { numRuns: 1000 },
      );
    }
  });
});
