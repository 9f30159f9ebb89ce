import { connectOrUnavailable } from '../db/connect-or-unavailable';
import { QuickAnswer, QuickQuery } from '@cairn/schema';
import { Router } from 'express';
import type { AppContext } from '../app';
import { actorOf, requirePermission } from '../auth/require';
import { atlasReaderOf } from '../services/atlas-query';
import { parseQuery } from '../http/validate';
import { documentRoute } from '../openapi/route-docs';
import { quickAnswer } from '../services/quick-answer';

/** GET /api/v1/quick: an answer at once from the atlas, a closed form or the fast bounds. */
export function quickRouter(ctx: AppContext): Router {
  const router = Router();
  documentRoute({
    method: 'get',
    path: '/api/v1/quick',
    tag: 'atlas',
    summary: 'What Cairn can say of a graph at once: the atlas entry, a closed form, or fast bounds',
    needs: 'atlas:read',
    query: QuickQuery,
    response: QuickAnswer,
  });
  router.get('/quick', requirePermission('atlas:read'), async (req, res) => {
    const { spec } = parseQuery(QuickQuery, req);
    res.json(await quickAnswer(await connectOrUnavailable(ctx.db), spec, atlasReaderOf(actorOf(req))));
  });
  return router;
}
