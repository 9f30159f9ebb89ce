import { RunExportQuery, RunView, ShareTokenParams } from '@cairn/schema';
import { Router } from 'express';
import type { AppContext } from '../app';
import { connectOrUnavailable } from '../db/connect-or-unavailable';
import { parseParams, parseQuery } from '../http/validate';
import { documentRoute } from '../openapi/route-docs';
import { exportRun } from '../services/run-export';
import { findSharedRun } from '../services/run-sharing';
import { toRunView } from '../services/run-view';

const TAG = 'shared';

/** Runs shared by link: anyone holding the token reads the run and its exports, without signing in. */
export function sharedRouter(ctx: AppContext): Router {
  const router = Router();
  const publicUrl = ctx.config.publicUrl;

  documentRoute({ method: 'get', path: '/api/v1/shared/:token', tag: TAG, summary: 'A run shared by link (no sign-in needed)', needs: 'none', params: ShareTokenParams, response: RunView, errors: [404] });
  router.get('/shared/:token', async (req, res) => {
    const { token } = parseParams(ShareTokenParams, req);
    const body: RunView = toRunView(await findSharedRun(await connectOrUnavailable(ctx.db), token), publicUrl);
    res.set('Cache-Control', 'no-store').json(body);
  });

  documentRoute({
    method: 'get',
    path: '/api/v1/shared/:token/export',
    tag: TAG,
    summary: 'Download a run shared by link: json, csv, svg or tikz (no sign-in needed)',
    needs: 'none',
    params: ShareTokenParams,
    query: RunExportQuery,
    responseType: 'application/octet-stream',
    errors: [404, 409],
  });
  router.get('/shared/:token/export', async (req, res) => {
    const { token } = parseParams(ShareTokenParams, req);
    const { format } = parseQuery(RunExportQuery, req);
    const source = await connectOrUnavailable(ctx.db);
    const file = await exportRun(source, await findSharedRun(source, token), format, publicUrl);
    res.status(200).type(file.contentType).attachment(file.fileName).set('Cache-Control', 'no-store').send(file.body);
  });

  return router;
}
