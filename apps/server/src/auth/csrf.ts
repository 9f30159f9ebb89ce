import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { RequestHandler } from 'express';
import { HttpError } from '../http/errors';

export const CSRF_HEADER = 'x-csrf-token';
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** A fresh synchronizer token for a new session (256 random bits). */
export function newCsrfToken(): string {
  return randomBytes(32).toString('base64url');
}

function sameToken(given: string, expected: string): boolean {
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  return a.length === b.length && timingSafeEqual(a, b);
}

/**
 * Every write authenticated by the session cookie must echo the session's token in X-CSRF-Token, which a
 * page on another site cannot read. Key-authenticated requests carry no cookie authority and are exempt.
 */
export const csrfProtection: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method) || req.actor?.kind !== 'session') return next();
  const expected = req.session.csrfToken;
  const given = req.get(CSRF_HEADER);
  if (!expected || !given || !sameToken(given, expected)) {
    return next(new HttpError(403, 'csrf', `a write with the session cookie needs the header X-CSRF-Token (its value is csrfToken of GET /api/v1/me)`));
  }
  next();
};
