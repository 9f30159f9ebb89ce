import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type Graph, graphFromEdges, LabelError, readLabelsCsv, writeLabelsCsv } from '../../src/index';
import { arbitraryGraph, arbitraryGridLikeGraph, gridLikeGraph, parseErrorOf, placeOf } from './arbitraries';

const labelsFor = (graph: Graph) => fc.array(fc.integer({ min: 1, max: 1000 }), { minLength: graph.vertexCount, maxLength: graph.vertexCount });

// 2 x 3 with a hole at row 1, column 2 (0-based (0, 1)): cells # . # / # # #, vertices 0..4 row-major.
const holed = gridLikeGraph(2, 3, [true, false, true, true, true, true]);
const path3 = graphFromEdges(3, [0, 1, 1, 2]);

describe('labels CSV for a grid-like graph', () => {
  it('writes the grid picture with "." for holes', () => {
    expect(writeLabelsCsv(holed, [1, 2, 3, 4, 5])).toBe('1,.,2\n3,4,5\n');
  });

  it('reads the picture back, holes as "." or empty fields, spaces around fields', () => {
    expect(Array.from(readLabelsCsv('1, . ,2\r\n3,4,5\r\n\r\n', holed))).toEqual([1, 2, 3, 4, 5]);
    expect(Array.from(readLabelsCsv('1,,2\n3,4,5', holed))).toEqual([1, 2, 3, 4, 5]);
  });

  it('reports wrong rows, fields and labels at their place', () => {
    const cases: [string, string, number, number][] = [
      ['a label in a hole', '1,7,2\n3,4,5\n', 1, 3],
      ['a hole marker on a vertex', '.,.,2\n3,4,5\n', 1, 1],
      ['too few fields', '1,.\n3,4,5\n', 1, 4],
      ['too many fields', '1,.,2,9\n3,4,5\n', 1, 6],
      ['too few rows', '1,.,2\n', 1, 6],
      ['too many rows', '1,.,2\n3,4,5\n6,7,8\n', 3, 1],
      ['label 0', '1,.,2\n3,0,5\n', 2, 3],
      ['not a whole number', '1,.,2\n3,4,5.5\n', 2, 5],
      ['empty label', '1,.,2\n3,,5\n', 2, 3],
    ];
    for (const [what, text, line, column] of cases) {
      expect({ what, ...placeOf(() => readLabelsCsv(text, holed)) }).toEqual({ what, format: 'labels-csv', line, column });
    }
    expect(parseErrorOf(() => readLabelsCsv('1,.,2\n3,0,5\n', holed)).expected).toMatch(/whole number 1\.\./);
  });

  it('round-trips random grid-like graphs with holes (1000 runs)', () => {
    fc.assert(
      fc.property(
        arbitraryGridLikeGraph.chain((graph) => labelsFor(graph).map((labels) => ({ graph, labels }))),
        ({ graph, labels }) => {
          const text = writeLabelsCsv(graph, labels);
          expect(text.split('\n')).toHaveLength(graph.layout!.rows + 1);
          expect(Array.from(readLabelsCsv(text, graph))).toEqual(labels);
        },
      ),
      { numRuns: 1000 },
    );
  });
});

describe('labels CSV for a plain graph', () => {
  it('writes the header "label" and one label a line', () => {
    expect(writeLabelsCsv(path3, [1, 2, 1])).toBe('label\n1\n2\n1\n');
  });

  it('reads one label a line, with or without the header', () => {
    expect(Array.from(readLabelsCsv('label\n1\n2\n1\n', path3))).toEqual([1, 2, 1]);
    expect(Array.from(readLabelsCsv('1\n2\n1', path3))).toEqual([1, 2, 1]);
  });

  it('reads "vertex,label" lines in any order, with or without the header', () => {
    expect(Array.from(readLabelsCsv('vertex,label\n2,1\n0,1\n1,2\n', path3))).toEqual([1, 2, 1]);
    expect(Array.from(readLabelsCsv('1, 2\n0, 1\n2, 1\n', path3))).toEqual([1, 2, 1]);
  });

  it('reports wrong counts, repeats and bad labels at their place', () => {
    const cases: [string, string, number, number][] = [
      ['too few labels', 'label\n1\n2\n', 3, 2],
      ['too many labels', '1\n2\n1\n3\n', 4, 1],
      ['label 0', '1\n0\n1\n', 2, 1],
      ['negative label', '1\n-2\n1\n', 2, 1],
      ['two fields in the one-label form', '1\n2,3\n1\n', 2, 2],
      ['vertex twice', '0,1\n1,2\n0,1\n', 3, 1],
      ['vertex missing', '0,1\n1,2\n', 2, 4],
      ['vertex out of range', '0,1\n3,2\n1,1\n', 2, 1],
      ['pair without a label', '0,1\n1\n2,1\n', 2, 2],
      ['three fields in the pair form', '0,1,5\n1,1\n2,1\n', 1, 4],
    ];
    for (const [what, text, line, column] of cases) {
      expect({ what, ...placeOf(() => readLabelsCsv(text, path3)) }).toEqual({ what, format: 'labels-csv', line, column });
    }
    expect(parseErrorOf(() => readLabelsCsv('0,1\n1,2\n', path3)).expected).toBe('a label for vertex 2');
  });

  it('refuses to write labels that are not one whole number >= 1 per vertex', () => {
    expect(() => writeLabelsCsv(path3, [1, 2])).toThrow(LabelError);
    expect(() => writeLabelsCsv(path3, [1, 0, 1])).toThrow(LabelError);
    expect(() => writeLabelsCsv(path3, [1, 1.5, 1])).toThrow(LabelError);
  });

  it('round-trips random graphs and labels (1000 runs)', () => {
    fc.assert(
      fc.property(
        arbitraryGraph.chain((graph) => labelsFor(graph).map((labels) => ({ graph, labels }))),
        ({ graph, labels }) => {
          expect(Array.from(readLabelsCsv(writeLabelsCsv(graph, labels), graph))).toEqual(labels);
        },
      ),
      { numRuns: 1000 },
    );
  });
});
