import { describe, expect, it } from 'vitest';
import {
  parseMaskText,
  readDimacs,
  readEdgeList,
  readJsonGraph,
  readLabelsCsv,
  readMatrixMarket,
  graphFromEdges,
  type ReadResult,
} from '../../src/index';
import { edgeList, fixture, parseErrorOf } from './arbitraries';

const encode = (text: string) => new TextEncoder().encode(text);

const READERS: [string, (input: string | Uint8Array) => unknown][] = [
  ['edge-list', (input) => readEdgeList(input)],
  ['dimacs', (input) => readDimacs(input)],
  ['matrix-market', (input) => readMatrixMarket(input)],
  ['json', (input) => readJsonGraph(input)],
  ['mask', (input) => parseMaskText(input)],
  ['labels-csv', (input) => readLabelsCsv(input, graphFromEdges(2, [0, 1]))],
];

describe('text input', () => {
  it('refuses bytes with a NUL in them as binary data, for every reader', () => {
    for (const [format, read] of READERS) {
      const error = parseErrorOf(() => read(Uint8Array.from([0x31, 0x20, 0x32, 0x0a, 0x33, 0x00, 0x34])));
      expect({ format: error.format, line: error.line, column: error.column }).toEqual({ format, line: 2, column: 2 });
      expect(error.message).toMatch(/expected text, found binary data/);
    }
  });

  it('refuses bytes that are not UTF-8, at the line of the first bad byte', () => {
    for (const [format, read] of READERS) {
      const error = parseErrorOf(() => read(Uint8Array.from([...encode('0 1\n1 2\nab'), 0xc3, 0x28])));
      expect({ format: error.format, line: error.line, column: error.column, found: error.found }).toEqual({ format, line: 3, column: 3, found: 'binary data' });
    }
    // an image file's header: not UTF-8
    expect(parseErrorOf(() => readEdgeList(Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a]))).line).toBe(1);
  });

  it('refuses a string holding NUL', () => {
    const error = parseErrorOf(() => readMatrixMarket('%%MatrixMarket matrix coordinate pattern general\n\u0000'));
    expect([error.line, error.column, error.expected, error.found]).toEqual([2, 1, 'text', 'binary data']);
  });

  it('reads UTF-8 bytes with and without a byte-order mark', () => {
    const text = fixture('dimacs-myciel3.col');
    const plain = readDimacs(encode(text)).graph;
    const marked = readDimacs(Uint8Array.from([0xef, 0xbb, 0xbf, ...encode(text)])).graph;
    expect(edgeList(marked)).toEqual(edgeList(plain));
    expect(readMatrixMarket(`\ufeff${fixture('nist-general-pattern.mtx')}`).graph.edgeCount).toBe(3);
  });

  it('counts columns from after a byte-order mark', () => {
    expect(parseErrorOf(() => readEdgeList('\ufeff0 x\n')).column).toBe(3);
  });

  it('reads Windows line endings the same as Unix ones in every format', () => {
    const crlf = (text: string) => text.replace(/\n/g, '\r\n');
    const same = (read: (text: string) => ReadResult, text: string) => {
      const a = read(text).graph;
      const b = read(crlf(text)).graph;
      expect(b.vertexCount).toBe(a.vertexCount);
      expect(edgeList(b)).toEqual(edgeList(a));
    };
    same(readDimacs, fixture('dimacs-myciel3.col'));
    same(readDimacs, fixture('pace-path5.gr'));
    same(readMatrixMarket, fixture('nist-symmetric-real.mtx'));
    same(readEdgeList, '4 2\n0 1\n2 3\n');
    same(readJsonGraph, '{\n"vertexCount": 2,\n"edges": [[0, 1]]\n}\n');
    expect(parseMaskText('#.\r\n##\r\n')).toEqual(parseMaskText('#.\n##\n'));
    // and errors point at the same place
    const error = parseErrorOf(() => readMatrixMarket(crlf('%%MatrixMarket matrix coordinate pattern general\n2 2 1\n1 3\n')));
    expect([error.line, error.column]).toEqual([3, 3]);
  });
});
