import express, { type Express } from 'express';
import { pinoHttp } from 'pino-http';
import { installAuth } from './auth/install-auth';
import type { ServerContext } from './context';
import type { CaughtMail } from './dev/mail-catcher';
import type { Jobs } from './jobs/jobs';
import { apiNotFound, errorHandler } from './http/errors';
import { rateLimits, securityHeaders } from './http/security';
import { webAppRouter } from './http/web-app';
import { healthRouter } from './routes/health.router';
import { v1Routers } from './routes/v1';

export interface AppContext extends ServerContext {
  jobs: Jobs;
  /** The local mail catcher's messages, when it runs in this process (development and tests). */
  devMailbox?: { messages(): readonly CaughtMail[] } | undefined;
  /** The folder of the built web app; without it only the API is served. */
  webDist?: string | undefined;
}

export function createApp(ctx: AppContext): Express {
  const { db, logger, webDist } = ctx;
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    pinoHttp({
      logger,
      // Health polls and hashed static files would drown the log; errors always show.
      autoLogging: { ignore: (req) => req.url === '/api/health' || (req.url ?? '').startsWith('/assets/') },
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info'),
    }),
  );
  for (const h of securityHeaders(ctx)) app.use(h);
  // Verification carries a label per vertex and parses its own, larger bodies.
  const json = express.json({ limit: '1mb' });
  app.use((req, res, next) => (req.path === '/api/v1/verify' ? next() : json(req, res, next)));
  installAuth(app, ctx);
  for (const h of rateLimits(ctx)) app.use('/api', h);

  const api = express.Router();
  api.use(healthRouter(db));
  for (const r of v1Routers(ctx)) api.use('/v1', r);
  api.use(apiNotFound);
  app.use('/api', api);

  if (webDist) app.use(webAppRouter(webDist));
  app.use(errorHandler(logger));
  return app;
}
