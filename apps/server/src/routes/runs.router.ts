import {
  RunExportQuery,
  RunIdParams,
  RunList,
  RunListQuery,
  RunRequest,
  RunShareRequest,
  RunShareResponse,
  RunView,
  RunVisibilityRequest,
} from '@cairn/schema';
import { Router } from 'express';
import type { AppContext } from '../app';
import { connectOrUnavailable } from '../db/connect-or-unavailable';
import { requirePermission } from '../auth/require';
import { parseBody, parseParams, parseQuery } from '../http/validate';
import { documentRoute } from '../openapi/route-docs';
import { findVisibleRun, memberActorOf } from '../services/run-access';
import { cancelRun, deleteRun } from '../services/run-cancel';
import { streamRunEvents } from '../services/run-events';
import { exportRun } from '../services/run-export';
import { listRuns } from '../services/run-list';
import { setRunVisibility, shareRun } from '../services/run-sharing';
import { toRunView } from '../services/run-view';
import { createRun } from '../services/runs';

const TAG = 'runs';

/**
 * Runs: submit (queued for the run workers), list, read, follow as server-sent events, cancel, delete,
 * change who sees it, share by mail, and export the result.
 */
export function runsRouter(ctx: AppContext): Router {
  const router = Router();
  const publicUrl = ctx.config.publicUrl;

  documentRoute({
    method: 'post',
    path: '/api/v1/runs',
    tag: TAG,
    summary: 'Queue a run on a graph (a spec or an uploaded graph); 202 with the new run, or 200 with your identical queued, running or finished run',
    needs: 'runs:write',
    body: RunRequest,
    response: RunView,
    status: 202,
    errors: [404, 413],
  });
  router.post('/runs', requirePermission('runs:write'), async (req, res) => {
    const actor = memberActorOf(req);
    const request = parseBody(RunRequest, req);
    const { run, created } = await createRun(ctx, await connectOrUnavailable(ctx.db), actor, request);
    res.status(created ? 202 : 200).location(run.links.self).json(run);
  });

  documentRoute({
    method: 'get',
    path: '/api/v1/runs',
    tag: TAG,
    summary: 'List runs newest first: your own and public ones (every run for an admin); filter by status, family, owner (a login or me)',
    needs: 'runs:read',
    query: RunListQuery,
    response: RunList,
  });
  router.get('/runs', requirePermission('runs:read'), async (req, res) => {
    const actor = memberActorOf(req);
    const query = parseQuery(RunListQuery, req);
    const body: RunList = await listRuns(await connectOrUnavailable(ctx.db), actor, query, publicUrl);
    res.json(body);
  });

  documentRoute({ method: 'get', path: '/api/v1/runs/:id', tag: TAG, summary: 'One run with its result (your own, a public one, or any for an admin)', needs: 'runs:read', params: RunIdParams, response: RunView, errors: [404] });
  router.get('/runs/:id', requirePermission('runs:read'), async (req, res) => {
    const actor = memberActorOf(req);
    const { id } = parseParams(RunIdParams, req);
    const body: RunView = toRunView(await findVisibleRun(await connectOrUnavailable(ctx.db), actor, id), publicUrl);
    res.json(body);
  });

  documentRoute({
    method: 'get',
    path: '/api/v1/runs/:id/events',
    tag: TAG,
    summary: 'Follow a run as server-sent events: status, progress (nodes, lower, upper, elapsedMs), then done, failed or cancelled with the run',
    needs: 'runs:read',
    params: RunIdParams,
    responseType: 'text/event-stream',
    errors: [404],
  });
  router.get('/runs/:id/events', requirePermission('runs:read'), async (req, res) => {
    const actor = memberActorOf(req);
    const { id } = parseParams(RunIdParams, req);
    const source = await connectOrUnavailable(ctx.db);
    await findVisibleRun(source, actor, id);
    await streamRunEvents(source, id, res, publicUrl, ctx.logger);
  });

  documentRoute({
    method: 'post',
    path: '/api/v1/runs/:id/cancel',
    tag: TAG,
    summary: 'Cancel a run (owner or admin): a queued run at once; a running one stops and keeps the best interval it reached',
    needs: 'runs:write',
    params: RunIdParams,
    response: RunView,
    status: 202,
    errors: [404, 409],
  });
  router.post('/runs/:id/cancel', requirePermission('runs:write'), async (req, res) => {
    const actor = memberActorOf(req);
    const { id } = parseParams(RunIdParams, req);
    const body: RunView = await cancelRun(await connectOrUnavailable(ctx.db), actor, id, publicUrl);
    res.status(202).json(body);
  });

  documentRoute({ method: 'delete', path: '/api/v1/runs/:id', tag: TAG, summary: 'Delete a run (owner or admin), cancelling it first if it is running; the atlas keeps its values', needs: 'runs:write', params: RunIdParams, status: 204, errors: [404] });
  router.delete('/runs/:id', requirePermission('runs:write'), async (req, res) => {
    const actor = memberActorOf(req);
    const { id } = parseParams(RunIdParams, req);
    await deleteRun(await connectOrUnavailable(ctx.db), actor, id);
    res.status(204).end();
  });

  documentRoute({
    method: 'patch',
    path: '/api/v1/runs/:id',
    tag: TAG,
    summary: 'Change who sees a run (owner or admin): private, link (makes a share link) or public; private revokes the link',
    needs: 'runs:write',
    params: RunIdParams,
    body: RunVisibilityRequest,
    response: RunView,
    errors: [404],
  });
  router.patch('/runs/:id', requirePermission('runs:write'), async (req, res) => {
    const actor = memberActorOf(req);
    const { id } = parseParams(RunIdParams, req);
    const { visibility } = parseBody(RunVisibilityRequest, req);
    const body: RunView = await setRunVisibility(await connectOrUnavailable(ctx.db), actor, id, visibility, publicUrl);
    res.json(body);
  });

  documentRoute({
    method: 'post',
    path: '/api/v1/runs/:id/share',
    tag: TAG,
    summary: 'Share your run by mail: it becomes at least link-visible and the address gets the link',
    needs: 'runs:write',
    params: RunIdParams,
    body: RunShareRequest,
    response: RunShareResponse,
    errors: [404],
  });
  router.post('/runs/:id/share', requirePermission('runs:write'), async (req, res) => {
    const actor = memberActorOf(req);
    const { id } = parseParams(RunIdParams, req);
    const { email } = parseBody(RunShareRequest, req);
    const body: RunShareResponse = await shareRun(ctx, await connectOrUnavailable(ctx.db), actor, id, email);
    res.json(body);
  });

  documentRoute({
    method: 'get',
    path: '/api/v1/runs/:id/export',
    tag: TAG,
    summary: 'Download a run: json (the run with its SolveResult), csv (vertex,label), svg or tikz (the ranking drawn)',
    needs: 'runs:read',
    params: RunIdParams,
    query: RunExportQuery,
    responseType: 'application/octet-stream',
    errors: [404, 409],
  });
  router.get('/runs/:id/export', requirePermission('runs:read'), async (req, res) => {
    const actor = memberActorOf(req);
    const { id } = parseParams(RunIdParams, req);
    const { format } = parseQuery(RunExportQuery, req);
    const source = await connectOrUnavailable(ctx.db);
    const file = await exportRun(source, await findVisibleRun(source, actor, id), format, publicUrl);
    res.status(200).type(file.contentType).attachment(file.fileName).send(file.body);
  });

  return router;
}
