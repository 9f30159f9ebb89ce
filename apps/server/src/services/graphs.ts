import { createHash } from 'node:crypto';
import { detectFormat, EngineError, ParseError, readGraphSpec, SizeError, type ReadResult } from '@cairn/engine';
import type { StoredGraphView, UploadFormat } from '@cairn/schema';
import type { DataSource, FindOptionsSelect } from 'typeorm';
import { seesEveryRun, type Actor } from '../auth/actor';
import { StoredGraph } from '../entities/stored-graph.entity';
import { HttpError } from '../http/errors';
import { readFileOffThread, type ReadSummary } from './graphs-off-thread';

/** Someone identified: a signed-in member or an API key's owner. */
export type MemberActor = Exclude<Actor, { kind: 'anonymous' }>;

/** An upload the engine has read: the format it was read as, and the graph with the reader's warnings. */
export interface ReadUpload {
  format: UploadFormat;
  read: ReadResult;
}

/** The same, when only the graph's counts came back (from a worker thread). */
export interface ReadUploadSummary {
  format: UploadFormat;
  read: ReadSummary;
}

/** Every column but the content: lists and views never load the stored bytes. */
const WITHOUT_CONTENT: FindOptionsSelect<StoredGraph> = {
  id: true,
  ownerId: true,
  name: true,
  format: true,
  sha256: true,
  vertexCount: true,
  edgeCount: true,
  sizeBytes: true,
  createdAt: true,
};

/** Files above this size are read on a worker thread (a 20 MB edge list takes the engine about a second). */
const OFF_THREAD_BYTES = 1024 * 1024;
const MAX_NAME_LENGTH = 200;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A name to show and to put in error messages: the file's base name without control characters. */
export function uploadName(given: string | undefined, fileName: string | undefined): string {
  const raw = given ?? fileName ?? '';
  const base = raw.slice(Math.max(raw.lastIndexOf('/'), raw.lastIndexOf('\\')) + 1);
  // eslint-disable-next-line no-control-regex
  const clean = base.replace(/[\u0000-\u001f\u007f]/g, '').trim().slice(0, MAX_NAME_LENGTH);
  return clean === '' ? 'upload' : clean;
}

/**
 * Reads an uploaded file with the engine (format given, or detected from name and content), here and now.
 * What the engine refuses becomes the API error naming line and column.
 */
export function readUpload(bytes: Uint8Array, name: string, format: UploadFormat | undefined): ReadUpload {
  const chosen: UploadFormat = format ?? detectFormat(bytes, name);
  try {
    return { format: chosen, read: readGraphSpec({ family: 'file', file: name, format: chosen }, () => bytes) };
  } catch (err) {
    throw uploadProblem(err, name) ?? err;
  }
}

/** readUpload for a file of any size: big ones are read on a worker thread, so other requests go on meanwhile. */
export async function readUploadWithoutBlocking(bytes: Uint8Array, name: string, format: UploadFormat | undefined): Promise<ReadUploadSummary> {
  if (bytes.length <= OFF_THREAD_BYTES) return readUpload(bytes, name, format);
  const chosen: UploadFormat = format ?? detectFormat(bytes, name);
  try {
    return { format: chosen, read: await readFileOffThread(bytes, name, chosen) };
  } catch (err) {
    throw uploadProblem(err, name) ?? err;
  }
}

/**
 * The engine's refusal of a file as an API error: where the fault is (`name:line:column: ...`), or that the
 * graph is too large (413), or binary data.
 */
export function uploadProblem(err: unknown, name: string): HttpError | undefined {
  if (err instanceof ParseError) {
    const where = { line: err.line, column: err.column };
    if (err.found === 'binary data') {
      return new HttpError(400, 'binary_file', `${name}:${err.line}:${err.column}: binary data, expected a text graph file (edge list, DIMACS, Matrix Market, JSON or mask)`, where);
    }
    const what = parseErrorWhat(err);
    return new HttpError(400, 'parse_error', `${name}:${err.line}:${err.column}: ${what ? `${what}: ` : ''}found ${err.found}, expected ${err.expected}`, {
      ...where,
      expected: err.expected,
      found: err.found,
      format: err.format,
    });
  }
  if (err instanceof SizeError) return new HttpError(413, 'graph_too_large', `${name}: ${err.message}`);
  if (err instanceof EngineError) return new HttpError(400, err.code === 'empty_graph' ? 'empty_graph' : 'invalid_graph', err.code === 'empty_graph' ? err.message : `${name}: ${err.message}`);
  return undefined;
}

/** The "what" of a ParseError (e.g. `at $.edges[2]`), which its message carries between place and expectation. */
function parseErrorWhat(err: ParseError): string {
  const head = `${err.format}: line ${err.line}, column ${err.column}: `;
  const tail = `expected ${err.expected}, found ${err.found}`;
  if (!err.message.startsWith(head) || !err.message.endsWith(tail)) return '';
  return err.message.slice(head.length, err.message.length - tail.length).replace(/:\s*$/, '');
}

export function sha256Of(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/**
 * Stores an upload once per owner and content: the same bytes again give the record stored before
 * (`created: false`). One INSERT ... ON CONFLICT DO NOTHING, so two identical uploads at once store one row.
 */
export async function storeUpload(
  source: DataSource,
  ownerId: string,
  upload: { name: string; format: UploadFormat; bytes: Buffer; read: ReadSummary },
): Promise<{ graph: StoredGraph; created: boolean }> {
  const sha256 = sha256Of(upload.bytes);
  const inserted = await source
    .createQueryBuilder()
    .insert()
    .into(StoredGraph)
    .values({
      ownerId,
      name: upload.name,
      format: upload.format,
      sha256,
      vertexCount: upload.read.graph.vertexCount,
      edgeCount: upload.read.graph.edgeCount,
      sizeBytes: upload.bytes.length,
      content: upload.bytes,
    })
    .orIgnore()
    .returning(['id'])
    .execute();
  const graph = await source.getRepository(StoredGraph).findOneOrFail({ where: { ownerId, sha256 }, select: WITHOUT_CONTENT });
  return { graph, created: (inserted.raw as unknown[]).length > 0 };
}

/** The API's view of stored graphs, with their owners' logins (one query for all of them). */
export async function graphViews(source: DataSource, graphs: StoredGraph[]): Promise<StoredGraphView[]> {
  const ownerIds = [...new Set(graphs.map((g) => g.ownerId))];
  const rows = ownerIds.length === 0 ? [] : ((await source.query(`SELECT id, login FROM users WHERE id = ANY($1)`, [ownerIds])) as { id: string; login: string }[]);
  const loginOf = new Map(rows.map((r) => [r.id, r.login]));
  return graphs.map((g) => ({
    id: g.id,
    name: g.name,
    format: g.format as UploadFormat,
    sha256: g.sha256,
    vertexCount: g.vertexCount,
    edgeCount: g.edgeCount,
    sizeBytes: g.sizeBytes,
    owner: { id: g.ownerId, login: loginOf.get(g.ownerId) ?? '' },
    createdAt: g.createdAt.toISOString(),
  }));
}

/** One page of the graphs an actor may see: their own, or every one for an admin. Newest first. */
export async function listGraphs(source: DataSource, actor: MemberActor, page: { limit: number; offset: number }): Promise<{ graphs: StoredGraph[]; total: number }> {
  const [graphs, total] = await source.getRepository(StoredGraph).findAndCount({
    where: seesEveryRun(actor) ? {} : { ownerId: actor.user.id },
    select: WITHOUT_CONTENT,
    order: { createdAt: 'DESC', id: 'ASC' },
    take: page.limit,
    skip: page.offset,
  });
  return { graphs, total };
}

/** A graph its owner or an admin asks for; anyone else gets the same 404 as for a graph that does not exist. */
export async function findVisibleGraph(source: DataSource, actor: MemberActor, id: string, withContent = false): Promise<StoredGraph> {
  const graph = await source.getRepository(StoredGraph).findOne({ where: { id }, ...(withContent ? {} : { select: WITHOUT_CONTENT }) });
  if (!graph || (graph.ownerId !== actor.user.id && !seesEveryRun(actor))) throw new HttpError(404, 'not_found', `no graph ${id}`);
  return graph;
}

/** Deletes a graph no run uses; 409 while runs refer to it (the foreign key refuses it too, under any race). */
export async function deleteGraph(source: DataSource, id: string): Promise<void> {
  try {
    await source.transaction(async (manager) => {
      const [{ count }] = (await manager.query(`SELECT count(*)::int AS count FROM runs WHERE graph_id = $1`, [id])) as [{ count: number }];
      if (count > 0) throw graphInUse(count);
      await manager.delete(StoredGraph, { id });
    });
  } catch (err) {
    if ((err as { driverError?: { code?: string } }).driverError?.code === '23503') throw graphInUse(undefined);
    throw err;
  }
}

function graphInUse(runCount: number | undefined): HttpError {
  const runs = runCount === undefined ? 'runs use it' : runCount === 1 ? '1 run uses it' : `${runCount} runs use it`;
  return new HttpError(409, 'graph_in_use', `the graph cannot be deleted while ${runs}; delete those runs first`, runCount === undefined ? undefined : { runCount });
}

/**
 * What the run workers hand the engine for an uploaded graph: a `file` spec in the stored format and the
 * file map of the pool's solve task (`{ kind: 'solve', spec, files }`), which carries text. Null when no
 * graph has that id. The content was accepted as UTF-8 text at upload, so decoding it loses nothing.
 */
export async function uploadForEngine(
  source: DataSource,
  graphId: string,
): Promise<{ spec: { family: 'file'; file: string; format: string }; files: Record<string, string>; sha256: string; graph: StoredGraph } | null> {
  if (!UUID.test(graphId)) return null;
  const graph = await source.getRepository(StoredGraph).findOneBy({ id: graphId });
  if (!graph) return null;
  const text = new TextDecoder('utf-8', { fatal: true }).decode(graph.content);
  return { spec: { family: 'file', file: graph.name, format: graph.format }, files: { [graph.name]: text }, sha256: graph.sha256, graph };
}
