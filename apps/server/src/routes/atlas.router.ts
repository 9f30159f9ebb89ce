import { AtlasEntryView, AtlasKeyParams, AtlasList, AtlasQuery } from '@cairn/schema';
import { Router } from 'express';
import type { AppContext } from '../app';
import { connectOrUnavailable } from '../db/connect-or-unavailable';
import { actorOf, requirePermission } from '../auth/require';
import { parseParams, parseQuery } from '../http/validate';
import { documentRoute } from '../openapi/route-docs';
import { atlasReaderOf, findAtlasEntry, listAtlas } from '../services/atlas-query';

const TAG = 'atlas';

/** The atlas: every value Cairn has established, one entry per graph; open to anonymous readers too. */
export function atlasRouter(ctx: AppContext): Router {
  const router = Router();

  documentRoute({
    method: 'get',
    path: '/api/v1/atlas',
    tag: TAG,
    summary: 'Atlas entries by family, sizes (rows, cols or ranges; rows <= cols for grids and tori) and exactness',
    needs: 'atlas:read',
    query: AtlasQuery,
    response: AtlasList,
  });
  router.get('/atlas', requirePermission('atlas:read'), async (req, res) => {
    const query = parseQuery(AtlasQuery, req);
    const body: AtlasList = await listAtlas(await connectOrUnavailable(ctx.db), query, atlasReaderOf(actorOf(req)));
    res.json(body);
  });

  documentRoute({ method: 'get', path: '/api/v1/atlas/:key', tag: TAG, summary: 'One atlas entry, by its key or any spec of the same graph (grid:9x4 finds grid:4x9)', needs: 'atlas:read', params: AtlasKeyParams, response: AtlasEntryView, errors: [404] });
  router.get('/atlas/:key', requirePermission('atlas:read'), async (req, res) => {
    const { key } = parseParams(AtlasKeyParams, req);
    const body: AtlasEntryView = await findAtlasEntry(await connectOrUnavailable(ctx.db), key, atlasReaderOf(actorOf(req)));
    res.json(body);
  });

  return router;
}
