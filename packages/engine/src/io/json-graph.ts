import { ParseError, type TextPosition } from '../errors';
import type { Graph } from '../graph/graph';
import { MAX_VERTICES } from '../graph/limits';
import { EdgeBuffer } from './edge-buffer';
import { fileFamily } from './file-family';
import { findJsonSyntaxError, formatJsonPath, jsonElementOffsets, jsonValueOffset, type JsonPathStep } from './json-locate';
import { buildSimpleGraph, type DroppedEdge } from './simple-graph';
import { decodeTextInput, type TextInput } from './text-input';
import { positionAt, positionsAt, quoted } from './text-position';
import { MAX_LISTED_WARNINGS, type ReadResult, type ReadWarning } from './warnings';

const FORMAT = 'json';
const KEYS = new Set(['vertexCount', 'edges', 'name']);
const SHAPE = '{"vertexCount": n, "edges": [[u, v], ...]}';

export interface JsonGraphReadOptions {
  /** The family's name when the document has no "name" of its own. */
  name?: string;
}

/**
 * Reads Cairn's JSON graph: {"vertexCount": n, "edges": [[u, v], ...], "name"?: "..."} with vertices
 * 0..n-1. No other keys are allowed (a misspelt key is an error, not silently ignored). Invalid JSON is
 * reported at the line and column of the fault, a wrong shape at the JSON path and place of the value.
 */
export function readJsonGraph(input: TextInput, options: JsonGraphReadOptions = {}): ReadResult {
  const text = decodeTextInput(input, FORMAT);
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (error) {
    throw jsonSyntaxError(text, error);
  }
  // Typed as never-returning so the checks below narrow the document's values.
  const fail: (path: JsonPathStep[], expected: string, found: string) => never = (path, expected, found) => {
    const offset = jsonValueOffset(text, path);
    const where = offset < 0 ? { line: 1, column: 1 } : positionAt(text, offset);
    throw new ParseError(FORMAT, where, expected, found, `at ${formatJsonPath(path)}`);
  };
  if (typeof doc !== 'object' || doc === null || Array.isArray(doc)) fail([], `an object ${SHAPE}`, describeJson(doc));
  const record = doc as Record<string, unknown>;
  for (const key of Object.keys(record)) {
    if (!KEYS.has(key)) fail([key], 'only the keys "vertexCount", "edges" and "name"', `the key ${quoted(key)}`);
  }
  const n = record.vertexCount;
  if (n === undefined) fail([], `a "vertexCount" key (${SHAPE})`, 'none');
  if (typeof n !== 'number' || !Number.isInteger(n) || n < 0 || n > MAX_VERTICES) {
    fail(['vertexCount'], `a whole number of vertices 0..${MAX_VERTICES}`, describeJson(n));
  }
  const name = record.name;
  if (name !== undefined && typeof name !== 'string') fail(['name'], 'a string', describeJson(name));
  const list = record.edges;
  if (list === undefined) fail([], `an "edges" key (${SHAPE})`, 'none');
  if (!Array.isArray(list)) fail(['edges'], 'an array of edges [u, v]', describeJson(list));

  const idExpected = n === 0 ? 'no vertex id (vertexCount is 0)' : `a vertex id 0..${n - 1}`;
  const edges = new EdgeBuffer(list.length);
  for (let k = 0; k < list.length; k++) {
    const edge: unknown = list[k];
    if (!Array.isArray(edge) || edge.length !== 2) fail(['edges', k], 'an edge [u, v]', describeJson(edge));
    const pair = edge as unknown[];
    for (let end = 0; end < 2; end++) {
      const id = pair[end];
      if (typeof id !== 'number' || !Number.isInteger(id) || id < 0 || id >= n) fail(['edges', k, end], idExpected, describeJson(id));
    }
    edges.push(pair[0] as number, pair[1] as number, 0, 0);
  }

  const dropped: DroppedEdge[] = [];
  let warningCount = 0;
  const graph = buildSimpleGraph(edges, {
    vertexCount: n,
    family: fileFamily(FORMAT, name ?? options.name),
    from: 0,
    base: 0,
    unordered: true,
    onDrop: (drop) => {
      warningCount++;
      if (dropped.length < MAX_LISTED_WARNINGS) dropped.push(drop);
    },
  });
  return { graph, warnings: warningsAt(text, edges, dropped), warningCount };
}

/** Writes {"vertexCount", "edges"} (and "name" for a graph read from a named file), one edge a line. */
export function writeJsonGraph(graph: Graph): string {
  const lines = ['{'];
  if (graph.family?.kind === 'file' && graph.family.name !== undefined) lines.push(`  "name": ${JSON.stringify(graph.family.name)},`);
  lines.push(`  "vertexCount": ${graph.vertexCount},`);
  if (graph.edgeCount === 0) {
    lines.push('  "edges": []');
  } else {
    lines.push('  "edges": [');
    const edgeLines: string[] = [];
    for (const [u, v] of graph.edges()) edgeLines.push(`    [${u}, ${v}]`);
    lines.push(edgeLines.join(',\n'), '  ]');
  }
  lines.push('}');
  return `${lines.join('\n')}\n`;
}

/** Where each listed dropped edge sits in the text: one sweep for all of them, only when there are any. */
function warningsAt(text: string, edges: EdgeBuffer, dropped: DroppedEdge[]): ReadWarning[] {
  if (dropped.length === 0) return [];
  const offsets = jsonElementOffsets(text, ['edges'], dropped.map((d) => d.index));
  const places = positionsAt(text, offsets.map((o) => Math.max(o, 0)));
  return dropped.map((drop, i): ReadWarning => {
    const { line, column } = offsets[i]! < 0 ? { line: 1, column: 1 } : places[i]!;
    const u = edges.ends[2 * drop.index]!;
    const v = edges.ends[2 * drop.index + 1]!;
    const message =
      drop.kind === 'self-loop'
        ? `edges[${drop.index}]: vertex ${u} is joined to itself; the loop is dropped`
        : `edges[${drop.index}]: edge {${u}, ${v}} repeats edges[${drop.firstIndex}]; the copy is dropped`;
    return { kind: drop.kind, line, column, message };
  });
}

/**
 * A ParseError for text JSON.parse refused. Engines that give "(line L column C)" or "at position N" are
 * believed; otherwise (V8's "Unexpected token ..." has no position) our own walker finds the fault.
 */
function jsonSyntaxError(text: string, error: unknown): ParseError {
  const message = error instanceof Error ? error.message : String(error);
  const lineColumn = /line (\d+) column (\d+)/.exec(message);
  const position = /at position (\d+)/.exec(message);
  const offset = position ? Number(position[1]) : findJsonSyntaxError(text);
  let where: TextPosition = { line: 1, column: 1 };
  if (lineColumn) where = { line: Number(lineColumn[1]), column: Number(lineColumn[2]) };
  else if (offset >= 0) where = positionAt(text, offset);
  const found = offset < 0 ? 'text that is not JSON' : offset >= text.length ? 'end of text' : quoted(text[offset]!);
  return new ParseError(FORMAT, where, 'valid JSON', found, 'invalid JSON');
}

function describeJson(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  if (Array.isArray(value)) return `an array of ${value.length} item${value.length === 1 ? '' : 's'}`;
  if (typeof value === 'object') return 'an object';
  if (typeof value === 'string') return quoted(value);
  return String(value);
}
