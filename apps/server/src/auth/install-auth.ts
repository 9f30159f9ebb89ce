import './require';
import type { Express } from 'express';
import pg from 'pg';
import type { ServerContext } from '../context';
import { csrfProtection } from './csrf';
import { keyAuthentication } from './key-auth';
import { sessionActor } from './session-actor';
import { sessionMiddleware } from './session';

/** What installAuth leaves running: the session store's connections. */
export interface AuthHandle {
  close(): Promise<void>;
}

const handles = new WeakMap<Express, AuthHandle>();

/**
 * Sessions live beside the members they name: the database the app's data source uses (the configured
 * one in a server; a test's own database in tests), falling back to the configured URL.
 */
function sessionDatabaseUrl(ctx: ServerContext): string {
  const { url } = ctx.db.source.options as { url?: string };
  return url ?? ctx.config.databaseUrl;
}

/**
 * Sets `req.actor` on every request. Under /api: an API key (Authorization: Bearer), else the session
 * cookie (sessions live in PostgreSQL), else anonymous; then the CSRF check for cookie-authenticated
 * writes. Static files get neither a session nor a store round trip.
 */
export function installAuth(app: Express, ctx: ServerContext): AuthHandle {
  const pool = new pg.Pool({ connectionString: sessionDatabaseUrl(ctx), max: 4, connectionTimeoutMillis: 3000, idleTimeoutMillis: 10_000, allowExitOnIdle: true });
  pool.on('error', (err) => ctx.logger.warn({ err }, 'session store connection lost'));
  const sessions = sessionMiddleware(ctx, pool);

  app.use((req, _res, next) => {
    req.actor = { kind: 'anonymous' };
    next();
  });
  app.use('/api', keyAuthentication(ctx), sessions.middleware, sessionActor(ctx), csrfProtection);

  let closing: Promise<void> | undefined;
  const handle: AuthHandle = {
    close: () => (closing ??= sessions.close().then(() => pool.end())),
  };
  handles.set(app, handle);
  return handle;
}

/** Closes what installAuth started for this app (call it when its server closes); a no-op for other apps. */
export async function closeAuth(app: Express): Promise<void> {
  await handles.get(app)?.close();
}
