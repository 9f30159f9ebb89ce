import type { Request, RequestHandler } from 'express';
import { HttpError } from '../http/errors';
import { actorCan, actorUser, type Actor, type Permission } from './actor';
import type { User } from '../entities/user.entity';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      /** Set for every request by the authentication middleware (anonymous when nothing identifies it). */
      actor?: Actor;
    }
  }
}

export function actorOf(req: Request): Actor {
  return req.actor ?? { kind: 'anonymous' };
}

/** The signed-in member (or key owner); 401 for anonymous requests. */
export function requireUser(req: Request): User {
  const user = actorUser(actorOf(req));
  if (!user) throw new HttpError(401, 'unauthenticated', 'sign in or send an API key (Authorization: Bearer cairn_...)');
  return user;
}

/**
 * Route guard: 401 when nobody is identified and the permission needs someone, 403 when the role or the
 * key's scopes do not allow it.
 */
export function requirePermission(permission: Permission): RequestHandler {
  return (req, _res, next) => {
    const actor = actorOf(req);
    if (actorCan(actor, permission)) return next();
    if (actor.kind === 'anonymous') {
      return next(new HttpError(401, 'unauthenticated', 'sign in or send an API key (Authorization: Bearer cairn_...)'));
    }
    const why =
      actor.kind === 'key' && permission !== 'admin'
        ? `this API key lacks the scope ${permission}` + (actorCan({ kind: 'session', user: actor.user }, permission) ? '' : ` (and the ${actor.user.role} role does not allow it)`)
        : `the ${actor.user.role} role may not do this (needs ${permission === 'admin' ? 'admin' : permission})`;
    next(new HttpError(403, 'forbidden', why));
  };
}
