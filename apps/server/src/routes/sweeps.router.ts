import { SweepExportQuery, SweepIdParams, SweepList, SweepListQuery, SweepRequest, SweepView } from '@cairn/schema';
import { Router } from 'express';
import type { AppContext } from '../app';
import { connectOrUnavailable } from '../db/connect-or-unavailable';
import { requirePermission } from '../auth/require';
import { parseBody, parseParams, parseQuery } from '../http/validate';
import { documentRoute } from '../openapi/route-docs';
import { memberActorOf } from '../services/run-access';
import { findVisibleSweep, listSweeps, sweepCsv } from '../services/sweeps-view';
import { createSweep } from '../services/sweeps';

const TAG = 'sweeps';

/** Sweeps: a table of runs over a range of sizes of one family, queued together. */
export function sweepsRouter(ctx: AppContext): Router {
  const router = Router();

  documentRoute({
    method: 'post',
    path: '/api/v1/sweeps',
    tag: TAG,
    summary: 'Queue a sweep: one run per cell of rows x cols (at most 400 cells); grid and torus cells with rows > cols share the run of their transpose',
    needs: 'runs:write',
    body: SweepRequest,
    response: SweepView,
    status: 201,
    errors: [413],
  });
  router.post('/sweeps', requirePermission('runs:write'), async (req, res) => {
    const actor = memberActorOf(req);
    const request = parseBody(SweepRequest, req);
    const body: SweepView = await createSweep(ctx, await connectOrUnavailable(ctx.db), actor, request);
    res.status(201).location(`/api/v1/sweeps/${body.sweep.id}`).json(body);
  });

  documentRoute({ method: 'get', path: '/api/v1/sweeps', tag: TAG, summary: 'List sweeps newest first: your own and public ones (every one for an admin)', needs: 'runs:read', query: SweepListQuery, response: SweepList });
  router.get('/sweeps', requirePermission('runs:read'), async (req, res) => {
    const actor = memberActorOf(req);
    const query = parseQuery(SweepListQuery, req);
    const body: SweepList = await listSweeps(await connectOrUnavailable(ctx.db), actor, query);
    res.json(body);
  });

  documentRoute({ method: 'get', path: '/api/v1/sweeps/:id', tag: TAG, summary: 'A sweep with its table of cells (status, rank number or bounds, provenance, run)', needs: 'runs:read', params: SweepIdParams, response: SweepView, errors: [404] });
  router.get('/sweeps/:id', requirePermission('runs:read'), async (req, res) => {
    const actor = memberActorOf(req);
    const { id } = parseParams(SweepIdParams, req);
    const body: SweepView = await findVisibleSweep(await connectOrUnavailable(ctx.db), actor, id);
    res.json(body);
  });

  documentRoute({
    method: 'get',
    path: '/api/v1/sweeps/:id/export',
    tag: TAG,
    summary: "Download a sweep's table as CSV (one row per cell)",
    needs: 'runs:read',
    params: SweepIdParams,
    query: SweepExportQuery,
    responseType: 'text/csv',
    errors: [404],
  });
  router.get('/sweeps/:id/export', requirePermission('runs:read'), async (req, res) => {
    const actor = memberActorOf(req);
    const { id } = parseParams(SweepIdParams, req);
    parseQuery(SweepExportQuery, req);
    const view = await findVisibleSweep(await connectOrUnavailable(ctx.db), actor, id);
    const name = `cairn-sweep-${view.sweep.family}-${view.sweep.rows.from}-${view.sweep.rows.to}x${view.sweep.cols.from}-${view.sweep.cols.to}-${id.slice(0, 8)}.csv`;
    res.status(200).type('text/csv; charset=utf-8').attachment(name).send(sweepCsv(view));
  });

  return router;
}
