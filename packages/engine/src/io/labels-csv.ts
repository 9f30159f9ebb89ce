import { EngineError, LabelError, ParseError } from '../errors';
import type { Graph } from '../graph/graph';
import { LineCursor } from './line-cursor';
import { decodeTextInput, type TextInput } from './text-input';
import { countOf, isBlankChar, quoted } from './text-position';

const FORMAT = 'labels-csv';
const COMMA = 44;
/** Labels are stored in an Int32Array. */
const MAX_LABEL = 2 ** 31 - 1;
const LABEL = `a label (a whole number 1..${MAX_LABEL})`;

/**
 * Reads a labelling (one whole number >= 1 per vertex) from CSV.
 * - A grid-like graph (one with a layout) is labelled as its picture: layout.rows lines of layout.cols
 *   comma-separated fields, field c of line r for the cell (r, c); a cell with no vertex (a mask hole) must
 *   hold "." or nothing.
 * - Any other graph: one label per line for vertices 0, 1, ... in order, after an optional header line
 *   `label`; or lines `vertex,label` (optional header `vertex,label`) naming every vertex 0..n-1 exactly once.
 * Fields may carry spaces around them; blank lines may follow the last row. Errors name line and column.
 */
export function readLabelsCsv(input: TextInput, graph: Graph): Int32Array {
  const text = decodeTextInput(input, FORMAT);
  return graph.layout ? readGridLabels(text, graph) : readListLabels(text, graph.vertexCount);
}

/** Writes labels in the form readLabelsCsv reads: the grid picture with "." for holes, else `label` and one a line. */
export function writeLabelsCsv(graph: Graph, labels: ArrayLike<number>): string {
  const n = graph.vertexCount;
  if (labels.length !== n) throw new LabelError(`expected ${n} labels, one per vertex, got ${labels.length}`);
  for (let v = 0; v < n; v++) {
    const l = labels[v]!;
    if (!Number.isInteger(l) || l < 1 || l > MAX_LABEL) throw new LabelError(`label of vertex ${v} must be a whole number 1..${MAX_LABEL}, got ${l}`);
  }
  const lines: string[] = [];
  const layout = graph.layout;
  if (layout) {
    const owner = cellOwners(graph);
    for (let r = 0; r < layout.rows; r++) {
      const fields: string[] = new Array(layout.cols);
      for (let c = 0; c < layout.cols; c++) {
        const v = owner[r * layout.cols + c]!;
        fields[c] = v < 0 ? '.' : String(labels[v]);
      }
      lines.push(fields.join(','));
    }
  } else {
    lines.push('label');
    for (let v = 0; v < n; v++) lines.push(String(labels[v]));
  }
  return `${lines.join('\n')}\n`;
}

function readGridLabels(text: string, graph: Graph): Int32Array {
  const { rows, cols } = graph.layout!;
  const owner = cellOwners(graph);
  const labels = new Int32Array(graph.vertexCount);
  const cursor = new LineCursor(text, FORMAT, { commaSeparates: true });
  const fieldsExpected = `${countOf(cols, 'field')}, one per grid column`;
  const field = new FieldReader(cursor);
  let r = 0;
  while (cursor.nextLine()) {
    if (r === rows) {
      if (cursor.isBlankLine()) continue;
      cursor.skipSpaces();
      cursor.fail(cursor.pos, `${countOf(rows, 'row')}, one per grid row`, 'another row', 'too many rows');
    }
    let c = 0;
    for (;;) {
      const separator = field.read();
      if (c === cols) cursor.fail(separator, fieldsExpected, 'another field', 'too many fields');
      const v = owner[r * cols + c]!;
      if (v >= 0) {
        labels[v] = parseLabel(cursor, field.from, field.to, `${LABEL} for vertex ${v}`);
      } else if (field.to > field.from && !(field.to - field.from === 1 && text.charCodeAt(field.from) === 46)) {
        cursor.fail(field.from, `"." or an empty field (row ${r + 1}, column ${c + 1} is a hole)`, quoted(text.slice(field.from, field.to)));
      }
      c++;
      if (!field.moreOnLine) break;
    }
    if (c < cols) cursor.fail(cursor.end, fieldsExpected, `${c}`, 'too few fields');
    r++;
  }
  if (r < rows) throw new ParseError(FORMAT, cursor.endOfText(), `${countOf(rows, 'row')}, one per grid row`, `${r} (the file ends early)`, 'too few rows');
  return labels;
}

function readListLabels(text: string, n: number): Int32Array {
  const labels = new Int32Array(n);
  const cursor = new LineCursor(text, FORMAT, { commaSeparates: true });
  const field = new FieldReader(cursor);
  let pairs: boolean | undefined; // lines "vertex,label"; undefined until the first line shows which form
  let count = 0;
  const givenOn = new Uint32Array(n); // lines "vertex,label": the line each vertex was labelled on
  let firstLine = true;
  while (cursor.nextLine()) {
    if (cursor.isBlankLine()) continue;
    if (firstLine) {
      firstLine = false;
      const header = text.slice(cursor.start, cursor.end).replace(/\s+/g, '').toLowerCase();
      if (header === 'label' || header === 'vertex,label') {
        pairs = header === 'vertex,label';
        continue;
      }
    }
    field.read();
    pairs ??= field.moreOnLine;
    if (!pairs) {
      if (field.moreOnLine) cursor.fail(field.comma, 'one label per line', 'a comma', 'too many fields');
      if (count === n) cursor.fail(field.from, `${countOf(n, 'label')}, one per vertex`, 'another label', 'too many labels');
      labels[count] = parseLabel(cursor, field.from, field.to, `${LABEL} for vertex ${count}`);
      count++;
      continue;
    }
    const vertexFrom = field.from;
    const v = parseWhole(cursor, field.from, field.to, 0, n - 1, n === 0 ? 'no vertex (the graph is empty)' : `a vertex 0..${n - 1}`);
    if (!field.moreOnLine) cursor.fail(cursor.end, 'a comma and a label after the vertex ("vertex,label")', 'end of line');
    field.read();
    if (field.moreOnLine) cursor.fail(field.comma, 'end of line (a line is "vertex,label")', 'a comma', 'too many fields');
    const label = parseLabel(cursor, field.from, field.to, `${LABEL} for vertex ${v}`);
    if (givenOn[v] !== 0) cursor.fail(vertexFrom, 'each vertex once', `vertex ${v} again (first on line ${givenOn[v]})`);
    givenOn[v] = cursor.line;
    labels[v] = label;
    count++;
  }
  if (count < n) {
    if (pairs) {
      const missing = givenOn.indexOf(0);
      throw new ParseError(FORMAT, cursor.endOfText(), `a label for vertex ${missing}`, `end of file (${count} of ${n} vertices have one)`, 'missing labels');
    }
    throw new ParseError(FORMAT, cursor.endOfText(), `${countOf(n, 'label')}, one per vertex`, `${count} (the file ends early)`, 'too few labels');
  }
  return labels;
}

/** Reads comma-separated fields of the cursor's line, trimming the white space around each. */
class FieldReader {
  /** The field's text, trimmed: from .. to. */
  from = 0;
  to = 0;
  /** A comma ends the field (at index `comma`), so another field follows on the line. */
  moreOnLine = false;
  comma = -1;

  constructor(private readonly cursor: LineCursor) {}

  /** Reads the field at the cursor; returns the index of the comma before it (or its start, for the first). */
  read(): number {
    const cursor = this.cursor;
    const text = cursor.text;
    const separator = cursor.pos > cursor.start ? cursor.pos - 1 : cursor.pos;
    let p = cursor.pos;
    while (p < cursor.end && text.charCodeAt(p) !== COMMA) p++;
    let from = cursor.pos;
    let to = p;
    while (from < to && isBlankChar(text.charCodeAt(from))) from++;
    while (to > from && isBlankChar(text.charCodeAt(to - 1))) to--;
    this.from = from;
    this.to = to;
    this.moreOnLine = p < cursor.end;
    this.comma = this.moreOnLine ? p : -1;
    cursor.pos = this.moreOnLine ? p + 1 : p;
    return separator;
  }
}

function parseLabel(cursor: LineCursor, from: number, to: number, expected: string): number {
  return parseWhole(cursor, from, to, 1, MAX_LABEL, expected);
}

function parseWhole(cursor: LineCursor, from: number, to: number, min: number, max: number, expected: string): number {
  const text = cursor.text;
  let value = 0;
  for (let p = from; p < to; p++) {
    const c = text.charCodeAt(p);
    if (c < 48 || c > 57) cursor.fail(from, expected, quoted(text.slice(from, to)));
    value = value * 10 + (c - 48);
  }
  if (to === from) cursor.fail(from, expected, 'an empty field');
  if (value < min || value > max) cursor.fail(from, expected, text.slice(from, to));
  return value;
}

/** owner[cell] = the vertex drawn in that cell of the layout, or -1 for a hole. */
function cellOwners(graph: Graph): Int32Array {
  const { rows, cols, cells } = graph.layout!;
  const owner = new Int32Array(rows * cols).fill(-1);
  if (cells.length !== graph.vertexCount) throw new EngineError('invalid_layout', `the layout places ${cells.length} vertices, the graph has ${graph.vertexCount}`);
  for (let v = 0; v < cells.length; v++) {
    const cell = cells[v]!;
    if (!(cell >= 0 && cell < owner.length) || owner[cell] !== -1) throw new EngineError('invalid_layout', `the layout puts vertex ${v} in cell ${cell}, outside the grid or on another vertex`);
    owner[cell] = v;
  }
  return owner;
}
