import connectPgSimple from 'connect-pg-simple';
import type { RequestHandler } from 'express';
import session from 'express-session';
import type pg from 'pg';
import type { ServerContext } from '../context';
import { HttpError } from '../http/errors';

declare module 'express-session' {
  interface SessionData {
    /** The signed-in member; absent before sign-in. */
    userId: string;
    /** The synchronizer token every cookie-authenticated write must echo in X-CSRF-Token. */
    csrfToken: string;
    /** Where to go after sign-in (a path on this site), kept from the start of the sign-in. */
    signInNext: string;
  }
}

export const SESSION_COOKIE = 'cairn.sid';
/** Two weeks; every request that reads the session moves the expiry in the store (touch). */
export const SESSION_MAX_AGE_MS = 14 * 24 * 60 * 60 * 1000;

export function sessionCookieOptions(ctx: ServerContext) {
  return { path: '/', httpOnly: true, sameSite: 'lax' as const, secure: ctx.config.publicUrl.startsWith('https:') };
}

/**
 * express-session on the `sessions` table (made by the migrations, never by the store). Requests that
 * carry an API key skip it: they are not cookie-authenticated and need no store round trip. So does the
 * health check, which must answer in its own shape even while the database (and so the store) is away.
 */
export function sessionMiddleware(ctx: ServerContext, pool: pg.Pool): { middleware: RequestHandler; close(): Promise<void> } {
  const PgStore = connectPgSimple(session);
  const store = new PgStore({
    pool,
    tableName: 'sessions',
    createTableIfMissing: false,
    errorLog: (...args: unknown[]) => ctx.logger.warn({ detail: args.map(String).join(' ') }, 'session store'),
  });
  const handler = session({
    name: SESSION_COOKIE,
    secret: ctx.config.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    cookie: { ...sessionCookieOptions(ctx), maxAge: SESSION_MAX_AGE_MS },
  });
  const middleware: RequestHandler = (req, res, next) => {
    if (req.get('authorization') !== undefined || req.path === '/health') return next();
    handler(req, res, (err?: unknown) => {
      if (err) {
        ctx.logger.warn({ err }, 'session store unavailable');
        return next(new HttpError(503, 'database_unavailable', 'the session store does not answer; try again shortly'));
      }
      next();
    });
  };
  return {
    middleware,
    // Stops the pruning timer; typed as void, it returns a promise in connect-pg-simple 10.
    close: async () => {
      await Promise.resolve(store.close());
    },
  };
}
