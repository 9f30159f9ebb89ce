import './require';
import type { Express } from 'express';
import type { ServerContext } from '../context';

/** Sessions, sign-in and API keys; sets `req.actor` on every request. Placeholder until sign-in lands. */
export function installAuth(app: Express, _ctx: ServerContext): void {
  app.use((req, _res, next) => {
    req.actor = { kind: 'anonymous' };
    next();
  });
}
