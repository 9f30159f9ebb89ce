import type { RequestHandler } from 'express';
import type { ServerContext } from '../context';
import { User } from '../entities/user.entity';
import { connectOrUnavailable } from '../db/connect-or-unavailable';

/**
 * A request not already identified by a key is the member its session names, read afresh each time (so a
 * role change counts at once); a session whose member no longer exists is dropped and the request is
 * anonymous.
 */
export function sessionActor(ctx: ServerContext): RequestHandler {
  return async (req, _res, next) => {
    try {
      if (req.actor?.kind === 'key') return next();
      req.actor = { kind: 'anonymous' };
      const userId = req.session?.userId;
      if (!userId) return next();
      const source = await connectOrUnavailable(ctx.db);
      const user = await source.getRepository(User).findOneBy({ id: userId });
      if (user) {
        req.actor = { kind: 'session', user };
        return next();
      }
      req.session.regenerate((err) => next(err));
    } catch (err) {
      next(err);
    }
  };
}
