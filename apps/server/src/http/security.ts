import type { RequestHandler } from 'express';
import type { ServerContext } from '../context';

/** Security headers for every answer. Placeholder until the security work lands. */
export function securityHeaders(_ctx: ServerContext): RequestHandler[] {
  return [];
}

/** Rate limits per API key and per address; after authentication, so a key is known. Placeholder. */
export function rateLimits(_ctx: ServerContext): RequestHandler[] {
  return [];
}
