import { connectOrUnavailable } from '../db/connect-or-unavailable';
import { Router, type Request, type RequestHandler } from 'express';
import multer from 'multer';
import { StoredGraphList, StoredGraphListQuery, StoredGraphParams, StoredGraphView, UploadFields, UploadForm, UploadResult } from '@cairn/schema';
import type { AppContext } from '../app';
import { actorOf, requirePermission, requireUser } from '../auth/require';
import { HttpError } from '../http/errors';
import { parseBody, parseParams, parseQuery } from '../http/validate';
import { documentRoute } from '../openapi/route-docs';
import { deleteGraph, findVisibleGraph, graphViews, listGraphs, readUploadWithoutBlocking, storeUpload, uploadName, type MemberActor } from '../services/graphs';

const TAG = 'graphs';

/** Content types of the stored files when they are sent back. */
const CONTENT_TYPE: Readonly<Record<string, string>> = { json: 'application/json; charset=utf-8' };
const TEXT = 'text/plain; charset=utf-8';

/**
 * Uploaded graphs: POST /api/v1/graphs (multipart, field `file`), the owner's list (every one for an
 * admin), one graph, its stored bytes, and deleting one no run uses.
 */
export function graphsRouter(ctx: AppContext): Router {
  const router = Router();
  const receiveFile = fileReceiver(ctx.config.uploadLimitBytes);

  documentRoute({
    method: 'post',
    path: '/api/v1/graphs',
    tag: TAG,
    summary: 'Upload a graph file (edge list, DIMACS, Matrix Market, JSON or mask); the same bytes again return the stored graph',
    needs: 'runs:write',
    body: UploadForm,
    bodyType: 'multipart/form-data',
    response: UploadResult,
    status: 201,
    errors: [413],
  });
  router.post('/graphs', requirePermission('runs:write'), receiveFile, async (req, res) => {
    const user = requireUser(req);
    const fields = parseBody(UploadFields, req);
    const file = req.file;
    if (!file) throw missingFile(req.is('multipart/form-data') ? 'the form has no file in the field "file"' : 'send multipart/form-data with the graph file in the field "file"');
    const name = uploadName(fields.name, file.originalname);
    const { format, read } = await readUploadWithoutBlocking(file.buffer, name, fields.format);
    const source = await connectOrUnavailable(ctx.db);
    const { graph, created } = await storeUpload(source, user.id, { name, format, bytes: file.buffer, read });
    const [view] = await graphViews(source, [graph]);
    const body: UploadResult = { graph: view!, created, warnings: read.warnings, warningCount: read.warningCount };
    res.status(created ? 201 : 200).json(body);
  });

  documentRoute({ method: 'get', path: '/api/v1/graphs', tag: TAG, summary: 'List uploaded graphs: your own, or every one for an admin; newest first', needs: 'runs:read', query: StoredGraphListQuery, response: StoredGraphList });
  router.get('/graphs', requirePermission('runs:read'), async (req, res) => {
    const query = parseQuery(StoredGraphListQuery, req);
    const source = await connectOrUnavailable(ctx.db);
    const { graphs, total } = await listGraphs(source, memberActor(req), query);
    const body: StoredGraphList = { items: await graphViews(source, graphs), total, limit: query.limit, offset: query.offset };
    res.json(body);
  });

  documentRoute({ method: 'get', path: '/api/v1/graphs/:id', tag: TAG, summary: 'One uploaded graph (its owner or an admin)', needs: 'runs:read', params: StoredGraphParams, response: StoredGraphView, errors: [404] });
  router.get('/graphs/:id', requirePermission('runs:read'), async (req, res) => {
    const { id } = parseParams(StoredGraphParams, req);
    const source = await connectOrUnavailable(ctx.db);
    const [view] = await graphViews(source, [await findVisibleGraph(source, memberActor(req), id)]);
    res.json(view);
  });

  documentRoute({
    method: 'get',
    path: '/api/v1/graphs/:id/content',
    tag: TAG,
    summary: 'The uploaded file as it was sent, under its name',
    needs: 'runs:read',
    params: StoredGraphParams,
    responseType: 'text/plain',
    errors: [404],
  });
  router.get('/graphs/:id/content', requirePermission('runs:read'), async (req, res) => {
    const { id } = parseParams(StoredGraphParams, req);
    const source = await connectOrUnavailable(ctx.db);
    const graph = await findVisibleGraph(source, memberActor(req), id, true);
    res.attachment(graph.name);
    res.setHeader('Content-Type', CONTENT_TYPE[graph.format] ?? TEXT);
    res.setHeader('ETag', `"${graph.sha256}"`);
    res.send(graph.content);
  });

  documentRoute({
    method: 'delete',
    path: '/api/v1/graphs/:id',
    tag: TAG,
    summary: 'Delete an uploaded graph no run uses (its owner or an admin)',
    needs: 'runs:write',
    params: StoredGraphParams,
    status: 204,
    errors: [404, 409],
  });
  router.delete('/graphs/:id', requirePermission('runs:write'), async (req, res) => {
    const { id } = parseParams(StoredGraphParams, req);
    const source = await connectOrUnavailable(ctx.db);
    await findVisibleGraph(source, memberActor(req), id);
    await deleteGraph(source, id);
    res.status(204).end();
  });

  return router;
}

/** The actor of a route that requirePermission has let through: always a member, since runs:* need one. */
function memberActor(req: Request): MemberActor {
  requireUser(req); // the 401 for an anonymous request, should a route ever be opened up
  return actorOf(req) as MemberActor;
}

/** multer in memory with the configured limits; everything it refuses becomes a JSON 4xx naming the problem. */
function fileReceiver(limitBytes: number): RequestHandler {
  const single = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: limitBytes, files: 1, fields: 4, fieldSize: 1024, fieldNameSize: 100, parts: 6 },
    defParamCharset: 'utf8',
  }).single('file');
  return (req, res, next) => single(req, res, (err: unknown) => next(err ? formProblem(err, limitBytes) : undefined));
}

function formProblem(err: unknown, limitBytes: number): HttpError {
  if (!(err instanceof multer.MulterError)) {
    return new HttpError(400, 'invalid_form', `the multipart form could not be read: ${err instanceof Error ? err.message : String(err)}`);
  }
  switch (err.code) {
    case 'LIMIT_FILE_SIZE':
      return new HttpError(413, 'file_too_large', `the file is larger than the upload limit of ${describeBytes(limitBytes)}`, { field: 'file', limitBytes });
    case 'LIMIT_FILE_COUNT':
      return new HttpError(400, 'too_many_files', 'send one file, in the field "file"', { field: 'file' });
    case 'LIMIT_UNEXPECTED_FILE':
      return new HttpError(400, 'unexpected_file', `a file came in the field "${err.field ?? ''}"; send it in the field "file"`, { field: err.field });
    default:
      return new HttpError(400, 'invalid_form', `the multipart form was refused: ${err.message.toLowerCase()}${err.field ? ` (field "${err.field}")` : ''}`, { field: err.field, reason: err.code });
  }
}

function missingFile(message: string): HttpError {
  return new HttpError(400, 'invalid_request', `body.file: ${message}`, { problems: [{ field: 'body.file', message }] });
}

function describeBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${+(bytes / (1024 * 1024)).toFixed(2)} MB`;
  if (bytes >= 1024) return `${+(bytes / 1024).toFixed(2)} KB`;
  return `${bytes} bytes`;
}
