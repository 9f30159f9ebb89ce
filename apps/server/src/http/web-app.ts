import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express, { type Router } from 'express';

/**
 * Serves the built web app and answers every other GET with its index.html, so the browser's router
 * owns the paths. Hashed assets are cached for good; index.html never is.
 */
export function webAppRouter(dist: string): Router {
  const router = express.Router();
  const index = join(dist, 'index.html');
  if (!existsSync(index)) {
    router.get('/{*splat}', (_req, res) => {
      res.status(503).type('text/plain').send('The Cairn web app is not built yet: run `pnpm build` (the README start command does).');
    });
    return router;
  }
  router.use('/assets', express.static(join(dist, 'assets'), { immutable: true, maxAge: '365d', fallthrough: false }));
  router.use(express.static(dist, { index: false }));
  router.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
  return router;
}
