import type { RequestHandler } from 'express';
import { HttpError } from '../http/errors';
import { requirePermission } from './require';

const needsAdmin = requirePermission('admin');

/**
 * Guard of the member and key management routes: a signed-in admin. An API key never qualifies, not even
 * an admin's (a leaked key must not be able to mint more keys or promote anyone).
 */
export const requireAdminSession: RequestHandler = (req, res, next) => {
  if (req.actor?.kind === 'key') {
    return next(new HttpError(403, 'forbidden', 'API keys cannot manage members or keys; sign in as an admin'));
  }
  needsAdmin(req, res, next);
};
