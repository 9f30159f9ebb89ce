import { EngineError, SpecError } from '../errors';
import { completeBipartiteGraph, completeGraph, cycleGraph, pathGraph, starGraph } from '../families/classic';
import { cylinderGraph } from '../families/cylinder';
import { gridGraph } from '../families/grid';
import { maskGraph } from '../families/mask';
import { randomGraph } from '../families/random-graph';
import { staircaseGraph } from '../families/staircase';
import { torusGraph } from '../families/torus';
import { randomTree, treeFromParents } from '../families/tree';
import type { Graph } from '../graph/graph';
import { detectFormat, parseMaskText, readGraph, type GraphFormat, type ReadResult } from '../io/index';
import { decodeTextInput } from '../io/text-input';
import type { GraphSpec } from './graph-spec';
import { parseParentArray } from './parent-array-text';
import { parseGraphSpec } from './parse-spec';

/** Reads the file a spec names; the caller supplies it, so the engine itself never touches a file system. */
export type FileLoader = (path: string) => string | Uint8Array;

function load(loader: FileLoader | undefined, path: string, spec: string): string | Uint8Array {
  if (!loader) throw new SpecError(`${spec} names a file, and no way to read files was given`);
  return loader(path);
}

/** Builds the graph a spec names, reading any file it names through `loader`. */
export function graphFromSpec(spec: GraphSpec | string, loader?: FileLoader): Graph {
  return readGraphSpec(spec, loader).graph;
}

/**
 * Builds the graph a spec names, with the warnings of reading its file (self-loops and repeated edges
 * dropped); families built by name have none.
 */
export function readGraphSpec(spec: GraphSpec | string, loader?: FileLoader): ReadResult {
  const s = typeof spec === 'string' ? parseGraphSpec(spec) : spec;
  if (s.family !== 'file') return { graph: familyGraph(s, loader), warnings: [], warningCount: 0 };
  const content = load(loader, s.file, s.file);
  const format = (s.format as GraphFormat | undefined) ?? detectFormat(content, s.file);
  if (format === 'mask') return { graph: maskGraph(parseMaskText(content)), warnings: [], warningCount: 0 };
  const read = readGraph(content, { fileName: s.file, format });
  if (read.graph.vertexCount === 0) throw new EngineError('empty_graph', `${s.file}: the graph has no vertices`);
  return read;
}

function familyGraph(s: Exclude<GraphSpec, { family: 'file' }>, loader: FileLoader | undefined): Graph {
  switch (s.family) {
    case 'grid':
      return gridGraph(s.rows, s.cols);
    case 'cylinder':
      return cylinderGraph(s.rows, s.cols);
    case 'torus':
      return torusGraph(s.rows, s.cols);
    case 'staircase':
      return staircaseGraph(s.t);
    case 'path':
      return pathGraph(s.n);
    case 'cycle':
      return cycleGraph(s.n);
    case 'complete':
      return completeGraph(s.n);
    case 'bipartite':
      return completeBipartiteGraph(s.a, s.b);
    case 'star':
      return starGraph(s.leaves);
    case 'random-tree':
      return randomTree(s.n, s.seed);
    case 'gnp':
      return randomGraph(s.n, s.p, s.seed);
    case 'mask': {
      const text = s.text ?? (s.file !== undefined ? load(loader, s.file, `mask:${s.file}`) : undefined);
      if (text === undefined) throw new SpecError('mask: expected a file or the mask text');
      return maskGraph(parseMaskText(text));
    }
    case 'tree': {
      const parents = s.parents ?? (s.file !== undefined ? parseParentArray(decodeTextInput(load(loader, s.file, `tree:${s.file}`), 'parent-array')) : undefined);
      if (parents === undefined) throw new SpecError('tree: expected a file or the parent array');
      return treeFromParents(parents);
    }
    default:
      // Only reachable from untyped callers (JSON from elsewhere): name what came instead of a family.
      throw new SpecError(`unknown graph family ${JSON.stringify((s as { family?: unknown }).family) ?? '(none)'}`);
  }
}
