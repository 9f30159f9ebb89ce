import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../app';
import { openApiDocument } from '../openapi/openapi-document';
import { documentedRoutes, documentRoute } from '../openapi/route-docs';
import { serverVersion } from '../version';

/**
 * GET /api/v1/openapi.json: the OpenAPI 3.1 document of the API, open to everyone. It is built when asked
 * for, not here: the other routers record their routes when their own factories run, after this one.
 */
export function openapiRouter(_ctx: AppContext): Router {
  const router = Router();
  documentRoute({
    method: 'get',
    path: '/api/v1/openapi.json',
    tag: 'meta',
    summary: 'This document: every route of the API with its parameters, bodies, answers and errors',
    needs: 'none',
    response: z.record(z.string(), z.unknown()),
  });
  router.get('/openapi.json', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.json(openApiDocument(documentedRoutes(), { version: serverVersion }));
  });
  return router;
}
