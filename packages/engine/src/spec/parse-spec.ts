import { SpecError } from '../errors';
import { MAX_EDGES, MAX_VERTICES } from '../graph/limits';
import { SPEC_FAMILIES, type GraphSpec } from './graph-spec';

const FAMILY_PREFIX = /^([a-z][a-z-]*):(.*)$/s;

function whole(family: string, name: string, raw: string | undefined, min: number, spec: string): number {
  if (raw === undefined || !/^\s*\d+\s*$/.test(raw)) {
    throw new SpecError(`${spec}: ${name} must be a whole number >= ${min}; expected ${SPEC_FAMILIES[family as keyof typeof SPEC_FAMILIES]}, got '${raw ?? ''}'`);
  }
  const value = Number(raw);
  if (value < min) throw new SpecError(`${spec}: ${name} must be a whole number >= ${min}, got ${value}`);
  if (!Number.isSafeInteger(value) || value > MAX_VERTICES) throw new SpecError(`${spec}: ${name} ${raw.trim()} is more than a graph may hold (${MAX_VERTICES} vertices)`);
  return value;
}

function pair(family: string, body: string, mins: [number, number], names: [string, string], spec: string): [number, number] {
  const parts = body.split(/[x×X]/);
  if (parts.length !== 2) throw new SpecError(`${spec}: expected ${SPEC_FAMILIES[family as keyof typeof SPEC_FAMILIES]} (two sizes joined by x), got '${body}'`);
  return [whole(family, names[0], parts[0], mins[0], spec), whole(family, names[1], parts[1], mins[1], spec)];
}

function capacity(spec: string, vertices: number, edges: number): void {
  if (vertices > MAX_VERTICES) throw new SpecError(`${spec} would have ${vertices} vertices; a graph may have at most ${MAX_VERTICES}`);
  if (edges > MAX_EDGES) throw new SpecError(`${spec} would have ${edges} edges; a graph may have at most ${MAX_EDGES}`);
}

/**
 * Reads the text form of a graph spec: `grid:4x7`, `cylinder:4x6`, `torus:4x4`, `staircase:6`, `path:10`,
 * `cycle:9`, `complete:5`, `bipartite:3x4`, `star:8`, `random-tree:100:7`, `gnp:60:0.1:7`, `mask:FILE`,
 * `tree:FILE`, or anything else as a file path. Sizes are checked here, so a spec that parses can be built.
 */
export function parseGraphSpec(input: string): GraphSpec {
  const spec = input.trim();
  if (spec === '') throw new SpecError('empty graph spec; expected e.g. grid:4x7, staircase:6 or a file path');
  const m = FAMILY_PREFIX.exec(spec);
  if (!m) return { family: 'file', file: spec };
  const family = m[1]!;
  const body = m[2]!.trim();
  switch (family) {
    case 'grid':
    case 'cylinder':
    case 'torus': {
      const min = family === 'grid' ? 1 : 3;
      const [rows, cols] = pair(family, body, [family === 'torus' ? 3 : 1, min], ['rows', 'cols'], spec);
      capacity(spec, rows * cols, 2 * rows * cols);
      return { family, rows, cols };
    }
    case 'staircase': {
      const t = whole(family, 't', body, 1, spec);
      capacity(spec, (t * (t + 1)) / 2, t * (t - 1));
      return { family, t };
    }
    case 'path':
    case 'cycle':
    case 'complete': {
      const n = whole(family, 'n', body, family === 'cycle' ? 3 : 1, spec);
      capacity(spec, n, family === 'complete' ? (n * (n - 1)) / 2 : n);
      return { family, n };
    }
    case 'bipartite': {
      const [a, b] = pair(family, body, [1, 1], ['a', 'b'], spec);
      capacity(spec, a + b, a * b);
      return { family, a, b };
    }
    case 'star': {
      const leaves = whole(family, 'leaves', body, 1, spec);
      capacity(spec, leaves + 1, leaves);
      return { family, leaves };
    }
    case 'random-tree': {
      const [n, seed = '1'] = body.split(':');
      return { family, n: whole(family, 'n', n, 1, spec), seed: whole(family, 'seed', seed, 0, spec) };
    }
    case 'gnp': {
      const [n, p, seed = '1'] = body.split(':');
      const size = whole(family, 'n', n, 1, spec);
      const prob = Number(p);
      if (p === undefined || p.trim() === '' || !(prob >= 0 && prob <= 1)) {
        throw new SpecError(`${spec}: p must be a probability in [0, 1]; expected ${SPEC_FAMILIES.gnp}, got '${p ?? ''}'`);
      }
      capacity(spec, size, (prob * size * (size - 1)) / 2);
      return { family, n: size, p: prob, seed: whole(family, 'seed', seed, 0, spec) };
    }
    case 'mask':
    case 'tree':
      if (body === '') throw new SpecError(`${spec}: expected ${SPEC_FAMILIES[family]}, a file to read`);
      return { family, file: body };
    default:
      throw new SpecError(`unknown graph family '${family}' in '${spec}'; expected one of ${Object.keys(SPEC_FAMILIES).join(', ')}, or a file path`);
  }
}

/** The text form of a spec; parseGraphSpec(formatGraphSpec(s)) gives s back for every spec with a text form. */
export function formatGraphSpec(spec: GraphSpec): string {
  switch (spec.family) {
    case 'grid':
    case 'cylinder':
    case 'torus':
      return `${spec.family}:${spec.rows}x${spec.cols}`;
    case 'staircase':
      return `staircase:${spec.t}`;
    case 'path':
    case 'cycle':
    case 'complete':
      return `${spec.family}:${spec.n}`;
    case 'bipartite':
      return `bipartite:${spec.a}x${spec.b}`;
    case 'star':
      return `star:${spec.leaves}`;
    case 'random-tree':
      return `random-tree:${spec.n}:${spec.seed}`;
    case 'gnp':
      return `gnp:${spec.n}:${spec.p}:${spec.seed}`;
    case 'mask':
    case 'tree':
      return spec.file ? `${spec.family}:${spec.file}` : `${spec.family}:(inline)`;
    case 'file':
      return spec.file;
  }
}
