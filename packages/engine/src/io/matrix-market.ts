import { ParseError } from '../errors';
import type { Graph } from '../graph/graph';
import { MAX_VERTICES } from '../graph/limits';
import { EdgeBuffer } from './edge-buffer';
import { fileFamily } from './file-family';
import { LineCursor } from './line-cursor';
import { buildSimpleGraph, warnAtBufferedEdge } from './simple-graph';
import { decodeTextInput, type TextInput } from './text-input';
import { countOf, quoted } from './text-position';
import { WarningList, type ReadResult } from './warnings';

const FORMAT = 'matrix-market';
const BANNER = '%%MatrixMarket';
const PERCENT = 37;

type Field = 'pattern' | 'real' | 'integer';
type Symmetry = 'general' | 'symmetric' | 'skew-symmetric' | 'hermitian';

export interface MatrixMarketReadOptions {
  /** Recorded as the name of the graph's family. */
  name?: string;
}

/**
 * Reads a Matrix Market coordinate file (Boisvert, Pozo, Remington, "The Matrix Market Exchange Formats:
 * Initial Design", NIST, 1996) as the graph of its off-diagonal pattern, made symmetric:
 * - the banner `%%MatrixMarket matrix coordinate <field> <symmetry>` (qualifiers in any case), then `%`
 *   comment lines, the size line `rows cols entries`, and exactly `entries` lines `i j [value]`, 1-based;
 * - the matrix must be square; the field may be pattern, real or integer (complex, and the dense `array`
 *   format, are refused); every symmetry is accepted, and only the pattern is used;
 * - an entry is structure whatever its value, 0 included (the file chose to store it);
 * - diagonal entries are not edges of the graph and are skipped without a warning;
 * - (i, j) and (j, i) make one edge. In a general matrix that is how the file says it, so no warning; in a
 *   symmetric one only one triangle should be stored, so a mirrored entry, like an exact repeat, is
 *   dropped with a duplicate-edge warning. Entries above the diagonal of a symmetric file are accepted.
 */
export function readMatrixMarket(input: TextInput, options: MatrixMarketReadOptions = {}): ReadResult {
  const text = decodeTextInput(input, FORMAT);
  const cursor = new LineCursor(text, FORMAT);
  const { field, symmetry } = readBanner(cursor);

  let sizeLine = false;
  while (cursor.nextLine()) {
    cursor.skipSpaces();
    if (cursor.atLineEnd() || cursor.peek() === PERCENT) continue;
    sizeLine = true;
    break;
  }
  if (!sizeLine) throw new ParseError(FORMAT, cursor.endOfText(), 'the size line "rows columns entries"', 'end of file', 'no size line');
  const rows = cursor.readWhole(`the number of rows (at most ${MAX_VERTICES})`, 0, MAX_VERTICES);
  cursor.skipSpaces();
  const columnsAt = cursor.pos;
  const cols = cursor.readWhole('the number of columns', 0, Number.MAX_SAFE_INTEGER);
  if (cols !== rows) cursor.fail(columnsAt, `${countOf(rows, 'column')} (a graph needs a square matrix)`, `${cols}`, 'the matrix is not square');
  const entries = cursor.readWhole('the number of entries', 0, Number.MAX_SAFE_INTEGER);
  cursor.expectLineEnd('end of line (the size line is "rows columns entries")');
  const sizeLineNumber = cursor.line;

  const hasValue = field !== 'pattern';
  const entryShape = hasValue ? `"row column value"` : `"row column"`;
  const index = `an index 1..${rows}`;
  // The size line is the file's claim; cap the allocation by what the text could hold ("1 2\n" per entry).
  const edges = new EdgeBuffer(Math.min(entries, (text.length >> 2) + 16));
  let read = 0;
  while (cursor.nextLine()) {
    cursor.skipSpaces();
    if (cursor.atLineEnd() || cursor.peek() === PERCENT) continue;
    const column = cursor.pos - cursor.start + 1;
    if (read === entries) {
      cursor.fail(cursor.pos, `end of file after ${countOf(entries, 'entry', 'entries')}, as the size line on line ${sizeLineNumber} says`, 'another entry', 'too many entries');
    }
    const i = cursor.readWhole(index, 1, rows, 'row index');
    const j = cursor.readWhole(index, 1, rows, 'column index');
    if (hasValue) readValue(cursor, field, entryShape);
    cursor.expectLineEnd(`end of line (a ${field} entry is ${entryShape})`);
    read++;
    if (i !== j) edges.push(i, j, cursor.line, column);
  }
  if (read < entries) {
    const found = `${read} (the file ends early)`;
    throw new ParseError(FORMAT, cursor.endOfText(), `${countOf(entries, 'entry', 'entries')}, as the size line on line ${sizeLineNumber} says`, found, 'truncated file');
  }
  const warnings = new WarningList();
  const unordered = symmetry !== 'general';
  const family = fileFamily(FORMAT, options.name);
  const graph = buildSimpleGraph(edges, { vertexCount: rows, family, from: 0, base: 1, unordered, onDrop: warnAtBufferedEdge(edges, warnings) });
  return warnings.result(graph);
}

/**
 * Writes the graph as its adjacency pattern: `pattern symmetric`, one entry (i, j) per edge from the lower
 * triangle (i > j), 1-based, in column order as the format's examples list them.
 */
export function writeMatrixMarket(graph: Graph): string {
  const n = graph.vertexCount;
  const lines = [
    `${BANNER} matrix coordinate pattern symmetric`,
    `% the adjacency pattern of a graph with ${n} vertices and ${graph.edgeCount} edges, written by Cairn`,
    `${n} ${n} ${graph.edgeCount}`,
  ];
  for (const [u, v] of graph.edges()) lines.push(`${v + 1} ${u + 1}`);
  return `${lines.join('\n')}\n`;
}

function readBanner(cursor: LineCursor): { field: Field; symmetry: Symmetry } {
  const expectedBanner = `the banner "${BANNER} matrix coordinate <field> <symmetry>"`;
  // Empty text has no line of its own; the banner is missing at the start of line 1.
  if (!cursor.nextLine()) throw new ParseError(FORMAT, { line: 1, column: 1 }, expectedBanner, 'empty text');
  const text = cursor.text;
  if (!text.startsWith(BANNER, cursor.start) || (cursor.start + BANNER.length < cursor.end && !cursor.isDelimiter(text.charCodeAt(cursor.start + BANNER.length)))) {
    cursor.fail(cursor.start, expectedBanner, cursor.start === cursor.end ? 'an empty line' : cursor.found(cursor.start), 'not a Matrix Market file');
  }
  cursor.pos = cursor.start + BANNER.length;
  const word = (): [string, number] => {
    const value = cursor.readWord();
    return [value.toLowerCase(), cursor.pos - value.length];
  };
  const [object, objectAt] = word();
  if (object !== 'matrix') cursor.fail(objectAt, 'the object "matrix"', foundWord(cursor, objectAt));
  const [format, formatAt] = word();
  if (format === 'array') cursor.fail(formatAt, 'the format "coordinate"', '"array" (a dense matrix; Cairn reads only the sparse coordinate format)');
  if (format !== 'coordinate') cursor.fail(formatAt, 'the format "coordinate"', foundWord(cursor, formatAt));
  const [field, fieldAt] = word();
  if (field === 'complex') cursor.fail(fieldAt, 'the field pattern, real or integer', '"complex" (Cairn does not read complex matrices)');
  if (field !== 'pattern' && field !== 'real' && field !== 'integer') cursor.fail(fieldAt, 'the field pattern, real or integer', foundWord(cursor, fieldAt));
  const [symmetry, symmetryAt] = word();
  if (symmetry !== 'general' && symmetry !== 'symmetric' && symmetry !== 'skew-symmetric' && symmetry !== 'hermitian') {
    cursor.fail(symmetryAt, 'the symmetry general, symmetric, skew-symmetric or hermitian', foundWord(cursor, symmetryAt));
  }
  cursor.expectLineEnd('end of the banner line');
  return { field, symmetry };
}

function foundWord(cursor: LineCursor, at: number): string {
  return at >= cursor.end ? 'end of line' : cursor.found(at);
}

/** Checks an entry's value: an integer, or a real in decimal or exponent notation. Its size does not matter. */
function readValue(cursor: LineCursor, field: Field, entryShape: string): void {
  cursor.skipSpaces();
  const text = cursor.text;
  const from = cursor.pos;
  const end = cursor.fieldEnd(from);
  let p = from;
  const digits = (): number => {
    const start = p;
    while (p < end && text.charCodeAt(p) >= 48 && text.charCodeAt(p) <= 57) p++;
    return p - start;
  };
  if (p < end && (text[p] === '+' || text[p] === '-')) p++;
  let ok: boolean;
  if (field === 'integer') {
    ok = digits() > 0;
  } else {
    let mantissa = digits();
    if (p < end && text[p] === '.') {
      p++;
      mantissa += digits();
    }
    ok = mantissa > 0;
    if (ok && p < end && (text[p] === 'e' || text[p] === 'E' || text[p] === 'd' || text[p] === 'D')) {
      p++;
      if (p < end && (text[p] === '+' || text[p] === '-')) p++;
      ok = digits() > 0;
    }
  }
  if (from === end) cursor.fail(from, `a value (a ${field} entry is ${entryShape})`, 'end of line');
  if (!ok || p !== end) cursor.fail(from, field === 'integer' ? 'an integer value' : 'a real value', quoted(text.slice(from, end)));
  cursor.pos = end;
}
