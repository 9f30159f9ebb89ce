import { ApiKeyCreatedResponse, ApiKeyCreateRequest, ApiKeyIdParams, ApiKeysQuery, ApiKeysResponse } from '@cairn/schema';
import { Router } from 'express';
import type { AppContext } from '../app';
import { requireAdminSession } from '../auth/admin-session';
import { connectOrUnavailable } from '../db/connect-or-unavailable';
import { requireUser } from '../auth/require';
import { HttpError } from '../http/errors';
import { parseBody, parseParams, parseQuery } from '../http/validate';
import { documentRoute } from '../openapi/route-docs';
import { createApiKey, listApiKeys, revokeApiKey } from '../services/api-keys';
import { UnknownMemberError } from '../services/members';

/** API keys: made, listed and revoked by a signed-in admin (never through a key). */
export function keysRouter(ctx: AppContext): Router {
  const router = Router();

  documentRoute({
    method: 'post',
    path: '/api/v1/keys',
    tag: 'keys',
    summary: 'Make an API key for a member; the answer holds the secret, shown this once',
    needs: 'admin',
    body: ApiKeyCreateRequest,
    response: ApiKeyCreatedResponse,
    status: 201,
  });
  router.post('/keys', requireAdminSession, async (req, res) => {
    const admin = requireUser(req);
    const input = parseBody(ApiKeyCreateRequest, req);
    try {
      const created: ApiKeyCreatedResponse = await createApiKey(await connectOrUnavailable(ctx.db), { ...input, createdBy: admin.id });
      res.status(201).set('Cache-Control', 'no-store').json(created);
    } catch (err) {
      if (err instanceof UnknownMemberError) throw new HttpError(404, 'not_found', `body.userId: ${err.message}`, { problems: [{ field: 'body.userId', message: err.message }] });
      throw err;
    }
  });

  documentRoute({ method: 'get', path: '/api/v1/keys', tag: 'keys', summary: "Every API key (or one member's), newest first, by prefix", needs: 'admin', query: ApiKeysQuery, response: ApiKeysResponse });
  router.get('/keys', requireAdminSession, async (req, res) => {
    const { userId } = parseQuery(ApiKeysQuery, req);
    const body: ApiKeysResponse = { keys: await listApiKeys(await connectOrUnavailable(ctx.db), { userId }) };
    res.json(body);
  });

  documentRoute({ method: 'delete', path: '/api/v1/keys/:id', tag: 'keys', summary: 'Revoke an API key at once (again is fine)', needs: 'admin', params: ApiKeyIdParams, status: 204 });
  router.delete('/keys/:id', requireAdminSession, async (req, res) => {
    const { id } = parseParams(ApiKeyIdParams, req);
    if (!(await revokeApiKey(await connectOrUnavailable(ctx.db), id))) throw new HttpError(404, 'not_found', `no API key ${id}`);
    res.status(204).end();
  });

  return router;
}
