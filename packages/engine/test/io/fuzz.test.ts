import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  detectFormat,
  parseMaskText,
  readDimacs,
  readEdgeList,
  readGraph,
  readJsonGraph,
  readLabelsCsv,
  readMatrixMarket,
  writeDimacs,
  writeEdgeList,
  writeJsonGraph,
  writeMatrixMarket,
  type GraphFormat,
} from '../../src/index';
import { arbitraryGraph, failsCleanly, gridLikeGraph } from './arbitraries';
import { graphFromEdges } from '../../src/index';

const plain = graphFromEdges(4, [0, 1, 1, 2, 2, 3]);
const grid = gridLikeGraph(2, 2, [true, false, true, true]);

const READERS: Record<string, (input: string | Uint8Array) => unknown> = {
  edgeList: (input) => readEdgeList(input),
  edgeList1: (input) => readEdgeList(input, { base: 1, header: true }),
  edgeList0: (input) => readEdgeList(input, { base: 0, header: false }),
  dimacs: (input) => readDimacs(input),
  matrixMarket: (input) => readMatrixMarket(input),
  json: (input) => readJsonGraph(input),
  mask: (input) => parseMaskText(input),
  labelsPlain: (input) => readLabelsCsv(input, plain),
  labelsGrid: (input) => readLabelsCsv(input, grid),
  readGraph: (input) => readGraph(input),
};

/** Text that looks like the formats: their keywords, digits, separators and line breaks, shuffled. */
const formatLikeText = fc
  .array(
    fc.constantFrom(
      '%%MatrixMarket', ' matrix', ' coordinate', ' pattern', ' real', ' general', ' symmetric', '%', 'p edge', 'p tw', 'e', 'c', 'n',
      '{', '}', '[', ']', '"vertexCount"', '"edges"', ':', ',', ' ', '\t', '\n', '\r\n', '0', '1', '2', '3', '12', '-1', '1.5', '#', '.', 'x',
      '\ufeff', 'label', 'vertex,label',
    ),
    { maxLength: 40 },
  )
  .map((pieces) => pieces.join(''));

/** A valid file of some format with a few characters replaced, inserted or cut. */
const damagedFile = fc
  .tuple(
    arbitraryGraph,
    fc.constantFrom<(g: ReturnType<typeof graphFromEdges>) => string>(writeEdgeList, writeDimacs, (g) => writeDimacs(g, { variant: 'tw' }), writeMatrixMarket, writeJsonGraph),
    fc.array(fc.tuple(fc.nat(), fc.nat(3), fc.string({ maxLength: 3 })), { minLength: 1, maxLength: 4 }),
  )
  .map(([graph, write, edits]) => {
    let text = write(graph);
    for (const [at, cut, insert] of edits) {
      const i = text.length === 0 ? 0 : at % text.length;
      text = text.slice(0, i) + insert + text.slice(i + cut);
    }
    return text;
  });

const anyInput = fc.oneof(
  fc.string(),
  fc.string({ unit: 'binary' }),
  fc.uint8Array({ maxLength: 64 }),
  formatLikeText,
  formatLikeText.map((text) => new TextEncoder().encode(text)),
  damagedFile,
);

describe('readers on arbitrary input', () => {
  for (const [name, read] of Object.entries(READERS)) {
    it(`${name} returns or throws a ParseError/EngineError, never anything else (1000 runs)`, () => {
      fc.assert(
        fc.property(anyInput, (input) => failsCleanly(() => read(input))),
        { numRuns: 1000 },
      );
    });
  }

  it('detectFormat never throws and names a format (1000 runs)', () => {
    const formats: GraphFormat[] = ['edge-list', 'dimacs', 'matrix-market', 'json', 'mask'];
    fc.assert(
      fc.property(anyInput, fc.option(fc.string({ maxLength: 12 })), (input, name) => {
        expect(formats).toContain(detectFormat(input, name ?? undefined));
      }),
      { numRuns: 1000 },
    );
  });
});
