import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { detectFormat, EngineError, ParseError, readGraph, writeGraph, type GraphFormat } from '../../src/index';
import { arbitraryGraph, edgeList, fixture } from './arbitraries';

const GRAPH_FORMATS: GraphFormat[] = ['edge-list', 'dimacs', 'matrix-market', 'json'];

describe('detectFormat', () => {
  it('goes by a known extension, in any case', () => {
    expect(detectFormat('', 'a.mtx')).toBe('matrix-market');
    expect(detectFormat('', 'dir/a.GR')).toBe('dimacs');
    expect(detectFormat('', 'a.dimacs')).toBe('dimacs');
    expect(detectFormat('', 'a.col')).toBe('dimacs');
    expect(detectFormat('', 'a.edges')).toBe('edge-list');
    expect(detectFormat('', 'a.el')).toBe('edge-list');
    expect(detectFormat('', 'C:\\graphs\\a.json')).toBe('json');
    expect(detectFormat('', 'a.mask')).toBe('mask');
  });

  it('goes by content without a name, for .txt and for unknown extensions', () => {
    expect(detectFormat(fixture('nist-symmetric-real.mtx'))).toBe('matrix-market');
    expect(detectFormat(fixture('dimacs-myciel3.col'), 'myciel3.txt')).toBe('dimacs');
    expect(detectFormat(fixture('pace-path5.gr'), 'path.graph')).toBe('dimacs');
    expect(detectFormat('p tw 2 1\n1 2\n')).toBe('dimacs');
    expect(detectFormat('  {"vertexCount": 1, "edges": []}')).toBe('json');
    expect(detectFormat('##.\n.##\n')).toBe('mask');
    expect(detectFormat('# comment\n0 1\n')).toBe('edge-list');
    expect(detectFormat('0 1\n', 'a.txt')).toBe('edge-list');
    expect(detectFormat('')).toBe('edge-list');
  });

  it('looks at bytes too, past a byte-order mark', () => {
    expect(detectFormat(new TextEncoder().encode('\ufeff%%MatrixMarket matrix coordinate pattern general\n'))).toBe('matrix-market');
  });
});

describe('readGraph and writeGraph', () => {
  it('dispatch to the readers and record the file name without its directories', () => {
    const { graph } = readGraph(fixture('dimacs-myciel3.col'), { fileName: 'graphs/myciel3.col' });
    expect(graph.edgeCount).toBe(20);
    expect(graph.family).toEqual({ kind: 'file', format: 'dimacs', name: 'myciel3.col' });
    expect(readGraph('1 2\n2 3\n', { base: 0 }).graph.vertexCount).toBe(4);
    expect(readGraph('1 2\n2 3\n').graph.vertexCount).toBe(3);
  });

  it('an explicit format wins over the name', () => {
    expect(readGraph('0 1\n', { format: 'edge-list', fileName: 'x.json' }).graph.edgeCount).toBe(1);
  });

  it('refuses masks and unknown formats with an EngineError', () => {
    expect(() => readGraph('##\n', { format: 'mask' })).toThrow(/mask family/);
    expect(() => readGraph('##\n#.\n')).toThrow(EngineError);
    expect(() => readGraph('##\n#.\n')).not.toThrow(ParseError);
    expect(() => readGraph('0 1', { format: 'graphml' as GraphFormat })).toThrow(/unknown graph format/);
    expect(() => writeGraph(readGraph('0 1').graph, 'mask')).toThrow(/formatMaskText/);
  });

  it('round-trip random graphs through every format, detected from the text (1000 runs)', () => {
    fc.assert(
      fc.property(arbitraryGraph, fc.constantFrom(...GRAPH_FORMATS), (graph, format) => {
        const text = writeGraph(graph, format);
        expect(detectFormat(text)).toBe(format);
        const back = readGraph(text, { base: 0 }).graph;
        expect(back.vertexCount).toBe(graph.vertexCount);
        expect(edgeList(back)).toEqual(edgeList(graph));
      }),
      { numRuns: 1000 },
    );
  });
});
