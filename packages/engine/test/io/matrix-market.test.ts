import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readMatrixMarket, writeMatrixMarket } from '../../src/index';
import { arbitraryGraph, edgeList, fixture, parseErrorOf, placeOf } from './arbitraries';

// Fixtures written by hand after the NIST Matrix Market exchange format, Boisvert, Pozo, Remington 1996.
const symmetric = fixture('nist-symmetric-real.mtx');
const general = fixture('nist-general-pattern.mtx');
const symmetricLines = symmetric.split('\n');
/** The symmetric fixture with line `lineNumber` (1-based) replaced. */
const symmetricWith = (lineNumber: number, text: string) => symmetricLines.map((l, i) => (i === lineNumber - 1 ? text : l)).join('\n');

describe('readMatrixMarket', () => {
  it('reads a symmetric real matrix as the graph of its off-diagonal pattern', () => {
    const { graph, warnings, warningCount } = readMatrixMarket(symmetric);
    expect(graph.vertexCount).toBe(5);
    // (2,1) (3,2) (4,1) (5,3) (5,4), 1-based; (5,3) holds the value 0 and is still structure
    expect(edgeList(graph)).toEqual([[0, 1], [0, 3], [1, 2], [2, 4], [3, 4]]);
    // diagonal entries are not self-loops of a graph: no warnings
    expect(warnings).toEqual([]);
    expect(warningCount).toBe(0);
    expect(graph.family).toEqual({ kind: 'file', format: 'matrix-market' });
  });

  it('symmetrises a general pattern matrix, (i, j) and (j, i) making one edge without a warning', () => {
    const { graph, warnings } = readMatrixMarket(general);
    expect(graph.vertexCount).toBe(4);
    expect(edgeList(graph)).toEqual([[0, 1], [0, 3], [1, 2]]);
    expect(warnings).toEqual([]);
  });

  it('warns about repeated entries, and about mirrored entries of a symmetric matrix', () => {
    const repeat = readMatrixMarket('%%MatrixMarket matrix coordinate pattern general\n3 3 3\n1 2\n2 1\n1 2\n');
    expect(repeat.warnings.map((w) => [w.kind, w.line])).toEqual([['duplicate-edge', 5]]);
    const mirrored = readMatrixMarket('%%MatrixMarket matrix coordinate integer symmetric\n3 3 2\n2 1 7\n1 2 7\n');
    expect(mirrored.warnings.map((w) => [w.kind, w.line, w.column])).toEqual([['duplicate-edge', 4, 1]]);
    expect(edgeList(mirrored.graph)).toEqual([[0, 1]]);
  });

  it('reads banner qualifiers in any case, integer values, skew-symmetric and blank lines', () => {
    const { graph } = readMatrixMarket('%%MatrixMarket MATRIX Coordinate INTEGER skew-symmetric\n\n3 3 2\n\n2 1 -4\n3 1 +2\n\n');
    expect(edgeList(graph)).toEqual([[0, 1], [0, 2]]);
  });

  it('reports malformed variants at the right line and column', () => {
    const cases: [string, string, number, number][] = [
      ['bad banner', symmetric.replace('%%MatrixMarket', '%%MatrixMarkt'), 1, 1],
      ['no banner', symmetricLines.slice(1).join('\n'), 1, 1],
      ['object other than matrix', symmetric.replace('matrix coordinate', 'vector coordinate'), 1, 16],
      ['dense array format', symmetric.replace('coordinate', 'array'), 1, 23],
      ['complex field', symmetric.replace('real', 'complex'), 1, 34],
      ['unknown symmetry', symmetric.replace('symmetric', 'diagonal'), 1, 39],
      ['missing size line', symmetricLines.slice(0, 5).join('\n'), 5, 2],
      ['not square', symmetricWith(6, '5 4 8'), 6, 3],
      ['size line not a number', symmetricWith(6, '5 5 eight'), 6, 5],
      ['truncated: too few entries', symmetricLines.slice(0, 13).join('\n'), 13, 6],
      ['truncated file ending in a newline', `${symmetricLines.slice(0, 13).join('\n')}\n`, 13, 6],
      ['too many entries', `${symmetric}5 1 1.0\n`, 15, 1],
      ['row index out of range', symmetricWith(10, '6 1 0.5'), 10, 1],
      ['column index 0', symmetricWith(10, '4 0 0.5'), 10, 3],
      ['index not a number', symmetricWith(10, '4 x 0.5'), 10, 3],
      ['value not a number', symmetricWith(10, '4 1 abc'), 10, 5],
      ['value missing', symmetricWith(10, '4 1'), 10, 4],
      ['extra field', symmetricWith(10, '4 1 0.5 9'), 10, 9],
      ['value in a pattern file', general.replace('2 3', '2 3 1'), 8, 5],
    ];
    for (const [what, text, line, column] of cases) {
      expect({ what, ...placeOf(() => readMatrixMarket(text)) }).toEqual({ what, format: 'matrix-market', line, column });
    }
  });

  it('says what it expected and found', () => {
    const truncated = parseErrorOf(() => readMatrixMarket(symmetricLines.slice(0, 13).join('\n')));
    expect(truncated.expected).toBe('8 entries, as the size line on line 6 says');
    expect(truncated.found).toBe('7 (the file ends early)');
    expect(truncated.message).toMatch(/truncated file/);
    const square = parseErrorOf(() => readMatrixMarket(symmetricWith(6, '5 4 8')));
    expect(square.message).toMatch(/not square/);
    expect(parseErrorOf(() => readMatrixMarket(symmetric.replace('real', 'complex'))).found).toMatch(/complex/);
    expect(parseErrorOf(() => readMatrixMarket(symmetric.replace('coordinate', 'array'))).found).toMatch(/array/);
  });
});

describe('writeMatrixMarket', () => {
  it('writes a pattern symmetric matrix, one lower-triangle entry per edge', () => {
    const graph = readMatrixMarket(general).graph;
    expect(writeMatrixMarket(graph).split('\n')).toEqual([
      '%%MatrixMarket matrix coordinate pattern symmetric',
      '% the adjacency pattern of a graph with 4 vertices and 3 edges, written by Cairn',
      '4 4 3',
      '2 1',
      '4 1',
      '3 2',
      '',
    ]);
  });

  it('round-trips random graphs (1000 runs)', () => {
    fc.assert(
      fc.property(arbitraryGraph, (graph) => {
        const back = readMatrixMarket(writeMatrixMarket(graph));
        expect(back.graph.vertexCount).toBe(graph.vertexCount);
        expect(edgeList(back.graph)).toEqual(edgeList(graph));
        expect(back.warningCount).toBe(0);
      }),
      { numRuns: 1000 },
    );
  });
});
