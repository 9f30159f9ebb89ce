import type { RequestHandler } from 'express';
import type { ServerContext } from '../context';
import { HttpError } from '../http/errors';
import { useApiKey } from '../services/api-keys';
import { connectOrUnavailable } from '../db/connect-or-unavailable';

const BEARER = /^Bearer[ ]+(\S+)[ ]*$/i;

/**
 * `Authorization: Bearer <secret>`: the key is looked up by the SHA-256 of its secret on every request
 * (so a revocation counts from the next request) and its last use recorded. A request with any other
 * Authorization header, or an unknown or revoked secret, is refused; one without the header passes on.
 */
export function keyAuthentication(ctx: ServerContext): RequestHandler {
  return async (req, res, next) => {
    const header = req.get('authorization');
    if (header === undefined) return next();
    const refuse = (message: string) => {
      res.set('WWW-Authenticate', 'Bearer realm="cairn"');
      next(new HttpError(401, 'invalid_key', message));
    };
    try {
      const secret = BEARER.exec(header)?.[1];
      if (!secret) return refuse('malformed Authorization header; send Authorization: Bearer cairn_...');
      const found = await useApiKey(await connectOrUnavailable(ctx.db), secret);
      if (!found) return refuse('unknown or revoked API key');
      req.actor = { kind: 'key', user: found.user, key: found.key };
      next();
    } catch (err) {
      next(err);
    }
  };
}
