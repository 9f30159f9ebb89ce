import fc from 'fast-check';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { graphFromEdges, readJsonGraph, writeJsonGraph } from '../../src/index';
import { arbitraryGraph, edgeList, parseErrorOf, placeOf } from './arbitraries';

afterEach(() => {
  vi.restoreAllMocks();
});

const document = ['{', '  "name": "a square",', '  "vertexCount": 4,', '  "edges": [', '    [0, 1],', '    [1, 2],', '    [2, 3],', '    [3, 0]', '  ]', '}'];
const withLine = (index: number, text: string) => document.map((l, i) => (i === index ? text : l)).join('\n');

describe('readJsonGraph', () => {
  it('reads {"vertexCount", "edges", "name"}', () => {
    const { graph, warnings } = readJsonGraph(document.join('\n'));
    expect(graph.vertexCount).toBe(4);
    expect(edgeList(graph)).toEqual([[0, 1], [0, 3], [1, 2], [2, 3]]);
    expect(graph.family).toEqual({ kind: 'file', format: 'json', name: 'a square' });
    expect(warnings).toEqual([]);
  });

  it('places syntax errors V8 gives no position for (our own scan finds them)', () => {
    // V8: "Unexpected token ',', ... is not valid JSON"
    expect(placeOf(() => readJsonGraph(withLine(5, '    [1, 2],,')))).toEqual({ format: 'json', line: 6, column: 12 });
    expect(placeOf(() => readJsonGraph(withLine(2, '  "vertexCount": four,')))).toEqual({ format: 'json', line: 3, column: 18 });
  });

  it('places syntax errors from "at position N" messages', () => {
    const error = parseErrorOf(() => readJsonGraph('{"vertexCount": 2,\n "edges": [[0, 1]'));
    expect([error.line, error.column, error.found]).toEqual([2, 18, 'end of text']);
    expect(placeOf(() => readJsonGraph('{"vertexCount": 2,\n "edges": []}\n  x'))).toEqual({ format: 'json', line: 3, column: 3 });
    expect(placeOf(() => readJsonGraph(''))).toEqual({ format: 'json', line: 1, column: 1 });
  });

  it('believes "(line L column C)" messages, and falls back to line 1 when a message has no place', () => {
    vi.spyOn(JSON, 'parse').mockImplementationOnce(() => {
      throw new SyntaxError("Expected ',' or '}' after property value in JSON at position 30 (line 2 column 5)");
    });
    expect(placeOf(() => readJsonGraph('{}'))).toEqual({ format: 'json', line: 2, column: 5 });
    vi.spyOn(JSON, 'parse').mockImplementationOnce(() => {
      throw new SyntaxError('something went wrong');
    });
    expect(placeOf(() => readJsonGraph('{"vertexCount": 0, "edges": []}'))).toEqual({ format: 'json', line: 1, column: 1 });
  });

  it('names the JSON path and place of a value of the wrong shape', () => {
    const outOfRange = parseErrorOf(() => readJsonGraph(withLine(6, '    [2, 4],')));
    expect([outOfRange.line, outOfRange.column]).toEqual([7, 9]);
    expect(outOfRange.message).toMatch(/edges\[2\]\[1\]/);
    expect(outOfRange.expected).toBe('a vertex id 0..3');
    expect(outOfRange.found).toBe('4');
    const cases: [string, string, number, number, RegExp][] = [
      ['fractional id', withLine(4, '    [0, 1.5],'), 5, 9, /edges\[0\]\[1\]/],
      ['string id', withLine(5, '    ["1", 2],'), 6, 6, /edges\[1\]\[0\]/],
      ['edge of three', withLine(5, '    [1, 2, 3],'), 6, 5, /edges\[1\]/],
      ['edge not an array', withLine(5, '    {"u": 1},'), 6, 5, /edges\[1\]/],
      ['negative vertex count', withLine(2, '  "vertexCount": -1,'), 3, 18, /vertexCount/],
      ['unknown key', withLine(1, '  "nmae": "a square",'), 2, 11, /nmae/],
      ['name not a string', withLine(1, '  "name": 7,'), 2, 11, /name/],
      ['edges not an array', '{"vertexCount": 1, "edges": 5}', 1, 29, /edges/],
      ['top level not an object', '\n [[0, 1]]', 2, 2, /top level/],
      ['no vertexCount', '{"edges": []}', 1, 1, /vertexCount/],
    ];
    for (const [what, text, line, column, path] of cases) {
      const error = parseErrorOf(() => readJsonGraph(text));
      expect({ what, line: error.line, column: error.column }).toEqual({ what, line, column });
      expect(error.message).toMatch(path);
    }
  });

  it('warns about self-loops and repeats at the place of the edge', () => {
    const { graph, warnings, warningCount } = readJsonGraph('{"vertexCount": 3, "edges": [\n  [0, 1],\n  [1, 0],\n  [2, 2]\n]}');
    expect(edgeList(graph)).toEqual([[0, 1]]);
    expect(warningCount).toBe(2);
    expect(warnings.map((w) => [w.kind, w.line, w.column])).toEqual([
      ['duplicate-edge', 3, 3],
      ['self-loop', 4, 3],
    ]);
    expect(warnings[0]!.message).toMatch(/edges\[0\]/);
  });
});

describe('writeJsonGraph', () => {
  it('writes one edge a line', () => {
    expect(writeJsonGraph(graphFromEdges(3, [0, 1, 1, 2]))).toBe('{\n  "vertexCount": 3,\n  "edges": [\n    [0, 1],\n    [1, 2]\n  ]\n}\n');
    expect(writeJsonGraph(graphFromEdges(2, []))).toBe('{\n  "vertexCount": 2,\n  "edges": []\n}\n');
  });

  it('keeps the name of a graph read from a named file', () => {
    const graph = readJsonGraph('{"vertexCount": 1, "edges": [], "name": "dot"}').graph;
    expect(JSON.parse(writeJsonGraph(graph))).toEqual({ name: 'dot', vertexCount: 1, edges: [] });
  });

  it('round-trips random graphs (1000 runs)', () => {
    fc.assert(
      fc.property(arbitraryGraph, (graph) => {
        const back = readJsonGraph(writeJsonGraph(graph)).graph;
        expect(back.vertexCount).toBe(graph.vertexCount);
        expect(edgeList(back)).toEqual(edgeList(graph));
      }),
      { numRuns: 1000 },
    );
  });
});
