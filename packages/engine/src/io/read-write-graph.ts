import { EngineError } from '../errors';
import type { Graph } from '../graph/graph';
import { detectFormat } from './detect';
import { readDimacs, writeDimacs } from './dimacs';
import { readEdgeList, writeEdgeList } from './edge-list';
import { isGraphFormat, type GraphFormat, GRAPH_FORMATS } from './formats';
import { readJsonGraph, writeJsonGraph } from './json-graph';
import { readMatrixMarket, writeMatrixMarket } from './matrix-market';
import type { TextInput } from './text-input';
import type { ReadResult } from './warnings';

export interface ReadGraphOptions {
  /** The format; detected from fileName and content when absent (see detectFormat). */
  format?: GraphFormat;
  /** Used for detection and recorded (without its directories) as the family's name. */
  fileName?: string;
  /** Vertex numbering of an edge list (see EdgeListReadOptions); other formats fix their own. */
  base?: 0 | 1 | 'auto';
  /** Header rule of an edge list (see EdgeListReadOptions). */
  header?: boolean | 'auto';
}

/**
 * Reads a graph in any format Cairn knows. A mask is not read here: mask text describes a shape, and the
 * graph of a shape is the mask family's to build, so 'mask' is an EngineError pointing there.
 */
export function readGraph(input: TextInput, options: ReadGraphOptions = {}): ReadResult {
  const format = options.format ?? detectFormat(input, options.fileName);
  const name = options.fileName === undefined ? undefined : baseName(options.fileName);
  checkFormat(format);
  switch (format) {
    case 'edge-list':
      return readEdgeList(input, { base: options.base ?? 'auto', header: options.header ?? 'auto', ...(name ? { name } : {}) });
    case 'dimacs':
      return readDimacs(input, name ? { name } : {});
    case 'matrix-market':
      return readMatrixMarket(input, name ? { name } : {});
    case 'json':
      return readJsonGraph(input, name ? { name } : {});
    case 'mask':
      throw new EngineError('mask_is_a_shape', 'mask text describes a shape, not a graph: parse it with parseMaskText and build the graph with the mask family');
  }
}

/** Writes a graph in a format readGraph reads back (edge lists 0-based with the header `n m`). */
export function writeGraph(graph: Graph, format: GraphFormat): string {
  checkFormat(format);
  switch (format) {
    case 'edge-list':
      return writeEdgeList(graph);
    case 'dimacs':
      return writeDimacs(graph, { variant: 'edge' });
    case 'matrix-market':
      return writeMatrixMarket(graph);
    case 'json':
      return writeJsonGraph(graph);
    case 'mask':
      throw new EngineError('mask_is_a_shape', 'a graph is not written as a mask: format the mask shape with formatMaskText');
  }
}

/** Callers from plain JavaScript (a CLI flag, a request body) may pass any string. */
function checkFormat(format: string): asserts format is GraphFormat {
  if (!isGraphFormat(format)) throw new EngineError('unknown_format', `unknown graph format ${JSON.stringify(format)}; expected one of ${GRAPH_FORMATS.join(', ')}`);
}

function baseName(fileName: string): string {
  return fileName.slice(Math.max(fileName.lastIndexOf('/'), fileName.lastIndexOf('\\')) + 1);
}
