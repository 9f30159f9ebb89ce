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

const FORMAT = 'dimacs';
const LETTER_C = 99;
const LETTER_E = 101;
const LETTER_N = 110;
const LETTER_P = 112;

/** 'edge': the DIMACS Challenge problem line `p edge N M` with `e u v` lines; 'tw': PACE's `p tw N M` with `u v` lines. */
export type DimacsVariant = 'edge' | 'tw';

export interface DimacsReadOptions {
  /** Recorded as the name of the graph's family. */
  name?: string;
}

export interface DimacsWriteOptions {
  /** Default 'edge'. */
  variant?: DimacsVariant;
}

/**
 * Reads the DIMACS graph format ("Clique and Coloring Problems Graph Format", DIMACS Challenge, 1993):
 * `c` comment lines, one problem line `p edge N M` before any edge, then M lines `e u v` with vertices
 * 1..N. Also reads `p col N M` (the same, as many coloring files write it), node descriptors `n ID VALUE`
 * (the weight is not part of the graph and is ignored), and the PACE variant `p tw N M` followed by M plain
 * lines `u v`. Every edge line counts towards M, including self-loops and repeats, which are dropped with
 * a warning.
 */
export function readDimacs(input: TextInput, options: DimacsReadOptions = {}): ReadResult {
  const text = decodeTextInput(input, FORMAT);
  const cursor = new LineCursor(text, FORMAT);
  let variant: DimacsVariant | undefined;
  let n = 0;
  let m = 0;
  let problemLine = 0;
  let edges = new EdgeBuffer(16);
  while (cursor.nextLine()) {
    cursor.skipSpaces();
    const first = cursor.peek();
    if (first === -1 || first === LETTER_C) continue;
    const lineStart = cursor.pos;
    if (first === LETTER_P) {
      cursor.pos++;
      if (!cursor.atLineEnd() && !cursor.isDelimiter(cursor.peek())) cursor.fail(lineStart, 'a line starting with c, e, n or p', cursor.found(lineStart));
      if (variant !== undefined) cursor.fail(lineStart, 'one problem line', `a second one (the first is on line ${problemLine})`);
      const word = cursor.readWord();
      if (word === 'edge' || word === 'edges' || word === 'col') variant = 'edge';
      else if (word === 'tw') variant = 'tw';
      else cursor.fail(cursor.pos - word.length, 'the problem format "edge" or "tw"', cursor.found(cursor.pos - word.length));
      n = cursor.readWhole(`the number of vertices (at most ${MAX_VERTICES})`, 0, MAX_VERTICES);
      m = cursor.readWhole(`the number of edges (at most ${MAX_EDGES})`, 0, MAX_EDGES);
      cursor.expectLineEnd('end of line (the problem line is "p FORMAT N M")');
      problemLine = cursor.line;
      // The count is the file's own claim; cap the allocation by what the text could hold.
      edges = new EdgeBuffer(Math.min(m, (text.length >> 2) + 16));
      continue;
    }
    if (first === LETTER_N) {
      if (variant === undefined) cursor.fail(lineStart, 'the problem line "p edge N M" first', 'a node descriptor');
      cursor.pos++;
      cursor.readWhole(`a vertex number 1..${n}`, 1, n);
      cursor.readWord(); // the node's value (a weight): not part of the graph
      cursor.expectLineEnd('end of line (a node descriptor is "n ID VALUE")');
      continue;
    }
    const isDigit = first >= 48 && first <= 57;
    if (first === LETTER_E || isDigit) {
      if (variant === undefined) {
        cursor.fail(lineStart, `the problem line "p ${first === LETTER_E ? 'edge' : 'tw'} N M" before any edge`, 'an edge before it');
      }
      if (variant === 'edge' && isDigit) cursor.fail(lineStart, 'a line starting with c, e, n or p', cursor.found(lineStart), 'a "p edge" file writes edges as "e u v"');
      if (variant === 'tw' && !isDigit) cursor.fail(lineStart, 'an edge "u v" or a comment "c"', cursor.found(lineStart), 'a "p tw" file writes edges without "e"');
      if (edges.count === m) cursor.fail(lineStart, `${countOf(m, 'edge')}, as the problem line on line ${problemLine} says`, 'one more edge', 'too many edges');
      if (!isDigit) {
        cursor.pos++;
        if (!cursor.atLineEnd() && !cursor.isDelimiter(cursor.peek())) cursor.fail(lineStart, 'a line starting with c, e, n or p', cursor.found(lineStart));
      }
      cursor.skipSpaces();
      const column = cursor.pos - cursor.start + 1;
      const expected = `a vertex number 1..${n}`;
      const u = cursor.readWhole(expected, 1, n);
      const v = cursor.readWhole(expected, 1, n);
      cursor.expectLineEnd(`end of line (an edge is "${variant === 'edge' ? 'e ' : ''}u v")`);
      edges.push(u, v, cursor.line, column);
      continue;
    }
    cursor.fail(lineStart, variant === 'tw' ? 'an edge "u v" or a comment "c"' : 'a line starting with c, e, n or p', cursor.found(lineStart));
  }
  if (variant === undefined) {
    throw new ParseError(FORMAT, cursor.endOfText(), 'the problem line "p edge N M" (or "p tw N M")', 'end of file', 'no problem line');
  }
  if (edges.count < m) {
    const found = `${edges.count} (the file ends early)`;
    throw new ParseError(FORMAT, cursor.endOfText(), `${countOf(m, 'edge')}, as the problem line on line ${problemLine} says`, found, 'too few edges');
  }
  const warnings = new WarningList();
  const family = fileFamily(FORMAT, options.name);
  const graph = buildSimpleGraph(edges, { vertexCount: n, family, from: 0, base: 1, unordered: true, onDrop: warnAtBufferedEdge(edges, warnings) });
  return warnings.result(graph);
}

/** Writes `p edge N M` and `e u v` lines, or PACE's `p tw N M` and `u v` lines; vertices numbered from 1. */
export function writeDimacs(graph: Graph, options: DimacsWriteOptions = {}): string {
  const variant = options.variant ?? 'edge';
  const prefix = variant === 'edge' ? 'e ' : '';
  const lines = [`p ${variant} ${graph.vertexCount} ${graph.edgeCount}`];
  for (const [u, v] of graph.edges()) lines.push(`${prefix}${u + 1} ${v + 1}`);
  return `${lines.join('\n')}\n`;
}
