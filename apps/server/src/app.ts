import express, { type Express } from 'express';
import { pinoHttp } from 'pino-http';
import type { Database } from './db/database';
import { apiNotFound, errorHandler } from './http/errors';
import { webAppRouter } from './http/web-app';
import type { Logger } from './logger';
import { healthRouter } from './routes/health.router';

export interface AppDeps {
  db: Database;
  logger: Logger;
  /** The folder of the built web app; without it only the API is served. */
  webDist?: string | undefined;
}

export function createApp({ db, logger, webDist }: AppDeps): Express {
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
  app.use(express.json({ limit: '1mb' }));

  const api = express.Router();
  api.use(healthRouter(db));
  api.use(apiNotFound);
  app.use('/api', api);

  if (webDist) app.use(webAppRouter(webDist));
  app.use(errorHandler(logger));
  return app;
}
