import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  detectFormat,
  writeDimacs,
  writeEdgeList,
  writeJsonGraph,
  writeMatrixMarket,
  type GraphFormat,
} from '../../src/index';
import { arbitraryGraph } from './arbitraries';
import { graphFromEdges } from '../../src/index';

// The readers themselves are fuzzed 10,000 times each in tests/reliability/fuzz-readers.test.ts; here
// only format detection, which that suite reaches only through readGraph.

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

describe('format detection on arbitrary input', () => {
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
