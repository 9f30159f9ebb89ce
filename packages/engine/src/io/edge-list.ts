import { ParseError } from '../errors';
import type { Graph } from '../graph/graph';
import { MAX_EDGES, MAX_VERTICES } from '../graph/limits';
import { EdgeBuffer } from './edge-buffer';
import { fileFamily } from './file-family';
import { LineCursor } from './line-cursor';
import { buildSimpleGraph, warnAtBufferedEdge } from './simple-graph';
import { decodeTextInput, type TextInput } from './text-input';
import { countOf } from './text-position';
import { WarningList, type ReadResult } from './warnings';

const FORMAT = 'edge-list';
const HASH = 35;
const PERCENT = 37;
const COMMA = 44;

export interface EdgeListReadOptions {
  /**
   * How the file numbers its vertices. 'auto' (the default) reads it as 1-based exactly when the smallest
   * id is 1 (so no 0 appears) and as 0-based otherwise; a 0-based file whose vertex 0 has no edge is
   * therefore read as 1-based, so pass the base when you know it.
   */
  base?: 0 | 1 | 'auto';
  /**
   * Whether the first line that is not a comment is a header.
   * - 'auto' (the default): a first line holding one number is the header `n`. A first line of two numbers
   *   `a b` is the header `n m` when exactly b edge lines follow and every id after it fits in a vertices;
   *   otherwise it is the first edge. (An edge list cannot tell `n m` from `u v` by syntax alone.)
   * - true: the first line is the header `n` or `n m`; m must equal the number of edge lines.
   * - false: there is no header; every line is an edge.
   */
  header?: boolean | 'auto';
  /** Recorded as the name of the graph's family. */
  name?: string;
}

export interface EdgeListWriteOptions {
  /** Number vertices from 0 (default) or 1. */
  base?: 0 | 1;
  /** Start with the header line `n m` (default true): the only way the file keeps isolated vertices. */
  header?: boolean;
}

/**
 * Reads an edge list: one edge `u v` a line, the ids separated by spaces, tabs or a comma; lines starting
 * with `#` or `%` are comments (also after an edge), blank lines are skipped. See EdgeListReadOptions for the
 * header and numbering rules. The vertex count is the header's n, else the largest id + 1 (0-based) or the
 * largest id (1-based). Self-loops and repeated edges (u v then v u included) are dropped with a warning.
 */
export function readEdgeList(input: TextInput, options: EdgeListReadOptions = {}): ReadResult {
  const text = decodeTextInput(input, FORMAT);
  const baseOption = options.base ?? 'auto';
  const headerOption = options.header ?? 'auto';
  const cursor = new LineCursor(text, FORMAT, { commaSeparates: true });
  const edges = new EdgeBuffer(Math.min(1 << 16, text.length >> 2));
  const idExpected = baseOption === 1 ? 'a vertex id (a whole number >= 1)' : 'a vertex id (a whole number)';

  let headerN = -1; // vertex count from the header, -1 when there is none (yet)
  let headerM = -1; // edge count from the header "n m"
  let headerLine = 0;
  let headerMColumn = 0;
  let seenData = false;
  // A first line "a b" under header 'auto' is buffered as edge 0 and decided at the end.
  let candidate = false;
  let candidateVColumn = 0;
  // Ids of the lines that are surely edges, and where the largest is written (for a range error).
  let minId = Infinity;
  let maxId = -1;
  let maxLine = 0;
  let maxColumn = 0;

  while (cursor.nextLine()) {
    cursor.skipSpaces();
    const first = cursor.peek();
    if (first === -1 || first === HASH || first === PERCENT) continue;
    const line = cursor.line;
    const uColumn = cursor.pos - cursor.start + 1;
    const u = cursor.readWhole(idExpected, 0, MAX_VERTICES);
    cursor.skipSpaces();
    if (cursor.peek() === COMMA) {
      cursor.pos++;
    } else if (cursor.atLineEnd() || cursor.peek() === HASH || cursor.peek() === PERCENT) {
      if (!seenData && headerOption !== false) {
        seenData = true;
        headerN = u;
        headerLine = line;
        continue;
      }
      cursor.fail(cursor.pos, 'a second vertex id', cursor.found(), 'an edge needs two vertex ids');
    }
    cursor.skipSpaces();
    const vColumn = cursor.pos - cursor.start + 1;
    // The first line may be the header "n m", and m may exceed any vertex id; the vertex-count check below
    // catches such a number if the line turns out to be an edge.
    const v = cursor.readWhole(idExpected, 0, seenData ? MAX_VERTICES : MAX_EDGES);
    cursor.skipSpaces();
    if (!cursor.atLineEnd() && cursor.peek() !== HASH && cursor.peek() !== PERCENT) {
      cursor.fail(cursor.pos, 'end of line (an edge is two vertex ids)', cursor.found());
    }
    if (!seenData) {
      seenData = true;
      if (headerOption === true) {
        headerN = u;
        headerM = v;
        headerLine = line;
        headerMColumn = vColumn;
        continue;
      }
      if (headerOption === 'auto') {
        candidate = true;
        candidateVColumn = vColumn;
        edges.push(u, v, line, uColumn);
        continue;
      }
    }
    if (baseOption === 1 && (u === 0 || v === 0)) {
      cursor.fail(cursor.start + (u === 0 ? uColumn : vColumn) - 1, 'a vertex id >= 1 (the file is read as 1-based)', '0');
    }
    if (headerN >= 0) {
      const top = baseOption === 0 ? headerN - 1 : headerN; // 'auto' is settled at the end
      if (u > top || v > top) {
        const bad = u > top ? uColumn : vColumn;
        cursor.fail(cursor.start + bad - 1, idRange(baseOption === 0 ? 0 : 1, top, headerN, headerLine), String(u > top ? u : v));
      }
    }
    if (u < minId) minId = u;
    if (v < minId) minId = v;
    if (u > maxId || v > maxId) {
      maxId = u >= v ? u : v;
      maxLine = line;
      maxColumn = u >= v ? uColumn : vColumn;
    }
    edges.push(u, v, line, uColumn);
  }

  let from = 0;
  if (candidate) {
    const a = edges.ends[0]!;
    const b = edges.ends[1]!;
    const rest = edges.count - 1;
    const restBase = resolveBase(baseOption, minId);
    if (rest === b && (rest === 0 || maxId <= a - 1 + restBase)) {
      headerN = a;
      headerM = b;
      headerLine = edges.lines[0]!;
      from = 1;
    } else {
      const line = edges.lines[0]!;
      if (baseOption === 1 && (a === 0 || b === 0)) {
        throw errorAt(line, a === 0 ? edges.columns[0]! : candidateVColumn, 'a vertex id >= 1 (the file is read as 1-based)', '0');
      }
      if (a < minId) minId = a;
      if (b < minId) minId = b;
      if (a > maxId || b > maxId) {
        maxId = a >= b ? a : b;
        maxLine = line;
        maxColumn = a >= b ? edges.columns[0]! : candidateVColumn;
      }
    }
  }

  const base = resolveBase(baseOption, minId);
  const edgeLines = edges.count - from;
  if (headerM >= 0 && headerM !== edgeLines) {
    throw errorAt(headerLine, headerMColumn, `${countOf(headerM, 'edge line')}, as the header "n m" says`, `${edgeLines}`, 'the header disagrees with the file');
  }
  let n: number;
  if (headerN >= 0) {
    if (maxId > headerN - 1 + base) {
      throw errorAt(maxLine, maxColumn, idRange(base, headerN - 1 + base, headerN, headerLine), String(maxId));
    }
    n = headerN;
  } else {
    n = edgeLines === 0 ? 0 : maxId + 1 - base;
    if (n > MAX_VERTICES) throw errorAt(maxLine, maxColumn, `a vertex id of at most ${MAX_VERTICES - 1 + base}`, String(maxId));
  }

  const warnings = new WarningList();
  const family = fileFamily(FORMAT, options.name);
  const graph = buildSimpleGraph(edges, { vertexCount: n, family, from, base, unordered: true, onDrop: warnAtBufferedEdge(edges, warnings) });
  return warnings.result(graph);
}

/** Writes `n m` (unless header is false) and then one `u v` line per edge, u < v, in ascending order. */
export function writeEdgeList(graph: Graph, options: EdgeListWriteOptions = {}): string {
  const base = options.base ?? 0;
  const lines: string[] = [];
  if (options.header ?? true) lines.push(`${graph.vertexCount} ${graph.edgeCount}`);
  for (const [u, v] of graph.edges()) lines.push(`${u + base} ${v + base}`);
  return lines.length === 0 ? '' : `${lines.join('\n')}\n`;
}

function resolveBase(option: 0 | 1 | 'auto', minId: number): 0 | 1 {
  return option === 'auto' ? (minId === 1 ? 1 : 0) : option;
}

function idRange(low: number, high: number, n: number, headerLine: number): string {
  return `a vertex id ${low}..${high} (the header on line ${headerLine} says ${n} vertices)`;
}

/** A ParseError for a position noted earlier in the scan (the cursor has moved on). */
function errorAt(line: number, column: number, expected: string, found: string, what?: string): ParseError {
  return new ParseError(FORMAT, { line, column }, expected, found, what);
}
