import { EngineError, graphFromSpec, parseGraphSpec, type GraphSpec as EngineSpec } from '@cairn/engine';
import type { RunRequest } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import { seesEveryRun } from '../auth/actor';
import { HttpError } from '../http/errors';
import { graphKeyOf, type GraphKey } from './graph-key';
import { uploadForEngine, type MemberActor } from './graphs';
import type { MemberLimits } from '../config';
import { tooLargeFor } from './run-limits';

/** A spec of a built-in family the server builds itself (masks and trees inline; no files). */
export type BuiltInSpec = Exclude<EngineSpec, { family: 'file' }>;

/** The graph of a run request, resolved and checked: what to store with the run and key the atlas by. */
export interface RunGraph {
  /** The JSON form stored with the run (an upload is `{ family: 'upload', graphId }`). */
  spec: Record<string, unknown>;
  specText: string;
  key: GraphKey;
  graphId: string | null;
  vertexCount: number;
  edgeCount: number;
}

const specProblem = (message: string, status = 400, code = 'invalid_request') =>
  new HttpError(status, code, `body.spec: ${message}`, { problems: [{ field: 'body.spec', message }] });

const NO_FILES =
  'the server reads no files; upload the file (POST /api/v1/graphs) and run it by graphId, or send a mask inline as { "family": "mask", "text": "##.\\n###" }';

/** The spec as people write it: the engine's text form, inline masks and trees by their size. */
export function specTextOf(spec: Record<string, unknown>): string {
  const s = spec as BuiltInSpec | { family: 'upload'; graphId: string; name?: string };
  if (s.family === 'upload') return `upload:${s.name ?? s.graphId}`;
  if (s.family === 'mask' && s.text !== undefined) {
    const lines = s.text.split('\n').filter((l) => l.trim() !== '');
    return `mask:${lines.length}x${Math.max(0, ...lines.map((l) => l.trim().length))} (${(s.text.match(/#/g) ?? []).length} cells)`;
  }
  if (s.family === 'tree' && s.parents !== undefined) return `tree:${s.parents.length} vertices`;
  switch (s.family) {
    case 'grid':
    case 'cylinder':
    case 'torus':
      return `${s.family}:${s.rows}x${s.cols}`;
    case 'staircase':
      return `staircase:${s.t}`;
    case 'path':
    case 'cycle':
    case 'complete':
      return `${s.family}:${s.n}`;
    case 'bipartite':
      return `bipartite:${s.a}x${s.b}`;
    case 'star':
      return `star:${s.leaves}`;
    case 'random-tree':
      return `random-tree:${s.n}:${s.seed}`;
    case 'gnp':
      return `gnp:${s.n}:${s.p}:${s.seed}`;
    default:
      return String((s as { family: string }).family);
  }
}

/** Vertices and edges a family spec will have, counted before anything is built (gnp: the expected edges). */
export function plannedSize(s: BuiltInSpec): { vertices: number; edges: number } {
  switch (s.family) {
    case 'grid':
      return { vertices: s.rows * s.cols, edges: 2 * s.rows * s.cols - s.rows - s.cols };
    case 'cylinder':
      return { vertices: s.rows * s.cols, edges: 2 * s.rows * s.cols - s.cols };
    case 'torus':
      return { vertices: s.rows * s.cols, edges: 2 * s.rows * s.cols };
    case 'staircase':
      return { vertices: (s.t * (s.t + 1)) / 2, edges: s.t * (s.t - 1) };
    case 'path':
      return { vertices: s.n, edges: s.n - 1 };
    case 'cycle':
      return { vertices: s.n, edges: s.n };
    case 'complete':
      return { vertices: s.n, edges: (s.n * (s.n - 1)) / 2 };
    case 'bipartite':
      return { vertices: s.a + s.b, edges: s.a * s.b };
    case 'star':
      return { vertices: s.leaves + 1, edges: s.leaves };
    case 'random-tree':
      return { vertices: s.n, edges: s.n - 1 };
    case 'gnp':
      return { vertices: s.n, edges: Math.round((s.p * s.n * (s.n - 1)) / 2) };
    case 'mask':
      return { vertices: (s.text?.match(/#/g) ?? []).length, edges: 2 * (s.text?.match(/#/g) ?? []).length };
    case 'tree':
      return { vertices: s.parents?.length ?? 0, edges: Math.max(0, (s.parents?.length ?? 1) - 1) };
  }
}

/** 413 graph_too_large when a graph is larger than the caller's role allows (an API key acts as its owner). */
function checkSize(what: string, vertices: number, edges: number, actor: MemberActor, limits: MemberLimits): void {
  const tooLarge = tooLargeFor(what, vertices, edges, actor.user.role, limits);
  if (tooLarge) throw specProblem(`${tooLarge} (use the cairn CLI for larger ones)`, 413, 'graph_too_large');
}

/** The built-in spec a request names, from its text or JSON form; file specs are refused. */
function builtInSpec(input: NonNullable<RunRequest['spec']>): BuiltInSpec | { family: 'upload'; graphId: string } {
  if (typeof input !== 'string') return input as BuiltInSpec | { family: 'upload'; graphId: string };
  let parsed: EngineSpec;
  try {
    parsed = parseGraphSpec(input);
  } catch (err) {
    if (err instanceof EngineError) throw specProblem(err.message);
    throw err;
  }
  if (parsed.family === 'file') throw specProblem(`'${input.trim()}' is not a family spec (such as grid:4x9); ${NO_FILES}`);
  if ((parsed.family === 'mask' || parsed.family === 'tree') && parsed.file !== undefined) throw specProblem(`${parsed.family}:FILE names a file; ${NO_FILES}`);
  return parsed;
}

/**
 * Resolves the graph of a run request: parses and size-checks the spec (against the limits of the caller's
 * role), builds it once (so a bad mask or parent array is a 400 now, not a failed run later), and keys it
 * for the atlas. An upload must be the caller's own (or the caller an admin); another member's upload is
 * 404, as if it did not exist.
 */
export async function resolveRunGraph(source: DataSource, actor: MemberActor, request: Pick<RunRequest, 'spec' | 'graphId'>, limits: MemberLimits): Promise<RunGraph> {
  const named = request.spec === undefined ? { family: 'upload' as const, graphId: request.graphId! } : builtInSpec(request.spec);
  if (named.family === 'upload') {
    const upload = await uploadForEngine(source, named.graphId);
    const field = request.spec === undefined ? 'body.graphId' : 'body.spec.graphId';
    if (!upload || (upload.graph.ownerId !== actor.user.id && !seesEveryRun(actor))) {
      throw new HttpError(404, 'not_found', `${field}: no uploaded graph ${named.graphId}`, { problems: [{ field, message: 'no such uploaded graph' }] });
    }
    checkSize(`the upload ${upload.graph.name}`, upload.graph.vertexCount, upload.graph.edgeCount, actor, limits);
    const spec = { family: 'upload', graphId: upload.graph.id, name: upload.graph.name };
    return {
      spec,
      specText: specTextOf(spec),
      key: graphKeyOf({ family: 'upload', sha256: upload.sha256 }),
      graphId: upload.graph.id,
      vertexCount: upload.graph.vertexCount,
      edgeCount: upload.graph.edgeCount,
    };
  }
  const planned = plannedSize(named);
  const specText = specTextOf(named as unknown as Record<string, unknown>);
  checkSize(specText, planned.vertices, planned.edges, actor, limits);
  let built;
  try {
    built = graphFromSpec(named);
  } catch (err) {
    if (err instanceof EngineError) throw specProblem(err.message);
    throw err;
  }
  checkSize(specText, built.vertexCount, built.edgeCount, actor, limits);
  return {
    spec: { ...named } as Record<string, unknown>,
    specText,
    key: graphKeyOf(named),
    graphId: null,
    vertexCount: built.vertexCount,
    edgeCount: built.edgeCount,
  };
}
