import { connectOrUnavailable } from '../db/connect-or-unavailable';
import express, { Router, type RequestHandler } from 'express';
import { EngineError, graphFromSpec, LabelError, parseGraphSpec, verifyRanking, type GraphSpec as EngineGraphSpec, type RankingViolation } from '@cairn/engine';
import { VerifyRequest, VerifyResponse } from '@cairn/schema';
import type { AppContext } from '../app';
import { actorOf, requirePermission, requireUser } from '../auth/require';
import { HttpError } from '../http/errors';
import { parseBody } from '../http/validate';
import { documentRoute } from '../openapi/route-docs';
import { findVisibleGraph, type MemberActor } from '../services/graphs';
import { verifyOffThread, type VerifyOutcome } from '../services/graphs-off-thread';

/** Labels of a graph of millions of vertices are a JSON array of many megabytes. */
const VERIFY_BODY_LIMIT = '32mb';
/** Verification runs on the request thread (it is linear in the graph), so the graph it builds is bounded. */
export const MAX_VERIFY_VERTICES = 4_000_000;
export const MAX_VERIFY_EDGES = 16_000_000;
/** Graphs larger than this (vertices + edges) are built and checked on a worker thread. */
const OFF_THREAD_SIZE = 250_000;

/**
 * POST /api/v1/verify: checks a labelling against a graph with the engine's verifier, without storing
 * anything. The graph is a spec (text or JSON) or an uploaded graph; specs that name files are refused,
 * since the server reads no files of the caller's.
 */
export function verifyRouter(ctx: AppContext): Router {
  const router = Router();
  documentRoute({
    method: 'post',
    path: '/api/v1/verify',
    tag: 'verify',
    summary: 'Check that labels are a ranking of a graph; a violation is two equal labels joined by a path of smaller ones',
    needs: 'runs:write',
    body: VerifyRequest,
    response: VerifyResponse,
    errors: [404, 413],
  });
  router.post('/verify', requirePermission('runs:write'), largeJsonBody(), async (req, res) => {
    requireUser(req);
    const body = parseBody(VerifyRequest, req);
    const target = await verifyTarget(ctx, actorOf(req) as MemberActor, body);
    checkSize(target.size, target.field);
    let outcome: VerifyOutcome;
    try {
      outcome =
        target.size.vertices + target.size.edges > OFF_THREAD_SIZE
          ? await verifyOffThread(target.spec, target.files, body.labels)
          : verifyInline(target.spec, target.files, body.labels);
    } catch (err) {
      if (err instanceof LabelError) throw fieldProblem('body.labels', err.message);
      if (err instanceof EngineError) throw fieldProblem(target.field, err.message);
      throw err;
    }
    const { verdict, vertexCount } = outcome;
    const counts = { labelCount: verdict.labelsUsed, maxLabel: verdict.maxLabel, vertexCount };
    const answer: VerifyResponse = verdict.valid
      ? { valid: true, ...counts }
      : { valid: false, ...counts, violation: { ...verdict.violation, message: describeViolation(verdict.violation) } };
    res.json(answer);
  });
  return router;
}

/** JSON bodies up to VERIFY_BODY_LIMIT; a larger one is a 413 that says the limit. */
function largeJsonBody(): RequestHandler {
  const parse = express.json({ limit: VERIFY_BODY_LIMIT });
  return (req, res, next) =>
    parse(req, res, (err?: unknown) => {
      const tooLarge = err && typeof err === 'object' && 'type' in err && err.type === 'entity.too.large';
      next(tooLarge ? new HttpError(413, 'body_too_large', `the request body is larger than the ${VERIFY_BODY_LIMIT.replace('mb', ' MB')} verification takes`) : err);
    });
}

/** What a verify request names: a spec the engine builds (with the files it reads), its size, and the field. */
interface VerifyTarget {
  spec: EngineGraphSpec;
  files: Record<string, Uint8Array>;
  size: GraphSize;
  field: 'body.spec' | 'body.graphId';
}

async function verifyTarget(ctx: AppContext, actor: MemberActor, body: VerifyRequest): Promise<VerifyTarget> {
  const graphId = body.graphId ?? (typeof body.spec === 'object' && body.spec.family === 'upload' ? body.spec.graphId : undefined);
  if (graphId === undefined) {
    const spec = engineSpec(body.spec!);
    return { spec, files: {}, size: sizeOf(spec), field: 'body.spec' };
  }
  const stored = await findVisibleGraph(await connectOrUnavailable(ctx.db), actor, graphId, true);
  return {
    spec: { family: 'file', file: stored.name, format: stored.format },
    files: { [stored.name]: stored.content },
    size: { vertices: stored.vertexCount, edges: stored.edgeCount },
    field: body.graphId !== undefined ? 'body.graphId' : 'body.spec',
  };
}

function verifyInline(spec: EngineGraphSpec, files: Record<string, Uint8Array>, labels: number[]): VerifyOutcome {
  const graph = graphFromSpec(spec, (path) => {
    const content = files[path];
    if (content === undefined) throw new Error(`unreachable: the spec names ${path}, which is not at hand`);
    return content;
  });
  return { verdict: verifyRanking(graph, labels), vertexCount: graph.vertexCount };
}

/** A spec the engine can build without reading files; text specs are parsed (and refused) here. */
function engineSpec(spec: Exclude<VerifyRequest['spec'], undefined>): EngineGraphSpec {
  if (typeof spec !== 'string') {
    // The JSON form carries masks and trees inline; uploads were taken care of before.
    if (spec.family === 'upload') throw new Error('unreachable: uploads are read by id');
    return spec;
  }
  let parsed: EngineGraphSpec;
  try {
    parsed = parseGraphSpec(spec);
  } catch (err) {
    throw fieldProblem('body.spec', err instanceof Error ? err.message : String(err));
  }
  const file = parsed.family === 'file' ? parsed.file : parsed.family === 'mask' || parsed.family === 'tree' ? parsed.file : undefined;
  if (file !== undefined) {
    throw fieldProblem(
      'body.spec',
      `${JSON.stringify(spec)} names a file, and the server reads no files of yours: upload it (POST /api/v1/graphs) and send its graphId, or send a mask or tree inline in the JSON form`,
    );
  }
  return parsed;
}

interface GraphSize {
  vertices: number;
  /** At least the number of edges the graph will have (the expected count for random graphs). */
  edges: number;
}

/** Vertex and edge counts read off a spec, before anything is built. */
function sizeOf(spec: EngineGraphSpec): GraphSize {
  switch (spec.family) {
    case 'grid':
      return { vertices: spec.rows * spec.cols, edges: spec.rows * (spec.cols - 1) + spec.cols * (spec.rows - 1) };
    case 'cylinder':
    case 'torus':
      return { vertices: spec.rows * spec.cols, edges: 2 * spec.rows * spec.cols };
    case 'staircase':
      return { vertices: (spec.t * (spec.t + 1)) / 2, edges: spec.t * (spec.t - 1) };
    case 'path':
      return { vertices: spec.n, edges: spec.n - 1 };
    case 'cycle':
      return { vertices: spec.n, edges: spec.n };
    case 'complete':
      return { vertices: spec.n, edges: (spec.n * (spec.n - 1)) / 2 };
    case 'bipartite':
      return { vertices: spec.a + spec.b, edges: spec.a * spec.b };
    case 'star':
      return { vertices: spec.leaves + 1, edges: spec.leaves };
    case 'random-tree':
      return { vertices: spec.n, edges: spec.n - 1 };
    case 'gnp':
      return { vertices: spec.n, edges: Math.ceil((spec.p * spec.n * (spec.n - 1)) / 2) };
    case 'mask': {
      const cells = (spec.text ?? '').split('#').length - 1;
      return { vertices: cells, edges: 2 * cells };
    }
    case 'tree':
      return { vertices: spec.parents?.length ?? 0, edges: Math.max(0, (spec.parents?.length ?? 0) - 1) };
    case 'file':
      throw new Error('unreachable: file specs are refused before');
  }
}

function checkSize(size: GraphSize, field: string): void {
  if (size.vertices <= MAX_VERIFY_VERTICES && size.edges <= MAX_VERIFY_EDGES) return;
  throw new HttpError(
    413,
    'graph_too_large',
    `${field}: the graph has ${size.vertices} vertices and ${size.edges} edges; verification here takes at most ${MAX_VERIFY_VERTICES} vertices and ${MAX_VERIFY_EDGES} edges (the command line verifies any size)`,
    { field, ...size, maxVertices: MAX_VERIFY_VERTICES, maxEdges: MAX_VERIFY_EDGES },
  );
}

function fieldProblem(field: string, message: string): HttpError {
  return new HttpError(400, 'invalid_request', `${field}: ${message}`, { problems: [{ field, message }] });
}

/** The violation in words; a long path is shortened in the sentence (the full path is beside it). */
function describeViolation(v: RankingViolation): string {
  const path = v.path.length <= 12 ? v.path.join('-') : `${v.path.slice(0, 5).join('-')}-...-${v.path.slice(-5).join('-')} (${v.path.length} vertices)`;
  return `vertices ${v.u} and ${v.v} both have label ${v.label}, and the path ${path} between them has no larger label, so this is not a ranking`;
}
