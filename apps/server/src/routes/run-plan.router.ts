import { connectOrUnavailable } from '../db/connect-or-unavailable';
import { RunIdParams, RunPlan, ShareTokenParams } from '@cairn/schema';
import { Router } from 'express';
import type { AppContext } from '../app';
import { requirePermission } from '../auth/require';
import { parseParams } from '../http/validate';
import { documentRoute } from '../openapi/route-docs';
import { findVisibleRun, memberActorOf } from '../services/run-access';
import { runPlanOf } from '../services/run-plan';
import { findSharedRun } from '../services/run-sharing';

/** The elimination forest, step plan and ordering of a run's certificate: for its readers and its share link. */
export function runPlanRouter(ctx: AppContext): Router {
  const router = Router();
  documentRoute({
    method: 'get',
    path: '/api/v1/runs/:id/plan',
    tag: 'runs',
    summary: "The elimination forest, step plan and elimination ordering of a run's certificate ranking",
    needs: 'runs:read',
    params: RunIdParams,
    response: RunPlan,
  });
  router.get('/runs/:id/plan', requirePermission('runs:read'), async (req, res) => {
    const { id } = parseParams(RunIdParams, req);
    const source = await connectOrUnavailable(ctx.db);
    res.json(await runPlanOf(source, await findVisibleRun(source, memberActorOf(req), id)));
  });
  documentRoute({
    method: 'get',
    path: '/api/v1/shared/:token/plan',
    tag: 'runs',
    summary: 'The plan of a run shared by link (no sign-in needed)',
    needs: 'none',
    params: ShareTokenParams,
    response: RunPlan,
  });
  router.get('/shared/:token/plan', async (req, res) => {
    const { token } = parseParams(ShareTokenParams, req);
    const source = await connectOrUnavailable(ctx.db);
    res.json(await runPlanOf(source, await findSharedRun(source, token)));
  });
  return router;
}
