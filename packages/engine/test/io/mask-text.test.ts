import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineError, formatMaskText, parseMaskText, type MaskShape } from '../../src/index';
import { parseErrorOf, placeOf } from './arbitraries';

const arbitraryShape: fc.Arbitrary<MaskShape> = fc
  .record({ rows: fc.integer({ min: 1, max: 12 }), cols: fc.integer({ min: 1, max: 12 }) })
  .chain(({ rows, cols }) =>
    fc
      .array(fc.boolean(), { minLength: rows * cols, maxLength: rows * cols })
      .filter((cells) => cells.some(Boolean))
      .map((cells) => ({ rows, cols, present: Uint8Array.from(cells, Number) })),
  );

describe('parseMaskText', () => {
  it('reads # as a cell and . as a hole, row-major', () => {
    expect(parseMaskText('##.\n#.#\n')).toEqual({ rows: 2, cols: 3, present: Uint8Array.from([1, 1, 0, 1, 0, 1]) });
  });

  it('accepts trailing white space, CRLF, no final newline, and blank lines before and after', () => {
    expect(parseMaskText('\n##  \r\n.#\t\r\n\n  \n')).toEqual({ rows: 2, cols: 2, present: Uint8Array.from([1, 1, 0, 1]) });
    expect(parseMaskText('#')).toEqual({ rows: 1, cols: 1, present: Uint8Array.from([1]) });
  });

  it('reports rows of the wrong length where they end early or run on', () => {
    const short = parseErrorOf(() => parseMaskText('###\n##\n###\n'));
    expect([short.line, short.column, short.found]).toEqual([2, 3, '2 (the row ends early)']);
    expect(placeOf(() => parseMaskText('###\n####\n'))).toEqual({ format: 'mask', line: 2, column: 4 });
  });

  it('reports any other character at its place', () => {
    expect(placeOf(() => parseMaskText('###\n#x#\n'))).toEqual({ format: 'mask', line: 2, column: 2 });
    expect(placeOf(() => parseMaskText('###\n# #\n'))).toEqual({ format: 'mask', line: 2, column: 2 });
    expect(placeOf(() => parseMaskText(' ##\n'))).toEqual({ format: 'mask', line: 1, column: 1 });
    expect(placeOf(() => parseMaskText('##\n\n##\n'))).toEqual({ format: 'mask', line: 2, column: 1 });
  });

  it('refuses an empty mask and one without cells', () => {
    expect(parseErrorOf(() => parseMaskText('')).found).toBe('empty text');
    expect(parseErrorOf(() => parseMaskText('\n \n')).found).toBe('only blank lines');
    expect(placeOf(() => parseMaskText('\n...\n...\n'))).toEqual({ format: 'mask', line: 2, column: 1 });
  });

  it('refuses more than 10^7 positions', () => {
    const wide = `${'#'.repeat(5_000_000)}\n`;
    expect(placeOf(() => parseMaskText(wide.repeat(3)))).toEqual({ format: 'mask', line: 3, column: 1 });
  });
});

describe('formatMaskText', () => {
  it('writes rows of # and . ending in newlines', () => {
    expect(formatMaskText({ rows: 2, cols: 3, present: Uint8Array.from([1, 1, 0, 1, 0, 1]) })).toBe('##.\n#.#\n');
  });

  it('refuses a shape whose flags do not match its size', () => {
    expect(() => formatMaskText({ rows: 2, cols: 2, present: new Uint8Array(3) })).toThrow(EngineError);
  });

  it('round-trips random shapes (1000 runs)', () => {
    fc.assert(
      fc.property(arbitraryShape, (shape) => {
        expect(parseMaskText(formatMaskText(shape))).toEqual(shape);
      }),
      { numRuns: 1000 },
    );
  });
});
