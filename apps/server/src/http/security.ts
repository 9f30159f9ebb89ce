import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit, type AugmentedRequest } from 'express-rate-limit';
import helmet from 'helmet';
import type { ApiError } from '@cairn/schema';
import type { ServerContext } from '../context';

const SELF = "'self'";
const NONE = "'none'";

/**
 * Security headers for every answer (helmet). The Content-Security-Policy fits the built web app: its
 * scripts, styles, fonts and images all come from this origin and index.html has no inline script, so
 * nothing inline is allowed; fonts may also be data: URLs (small ones inlined by the build), images data:
 * and blob: URLs (figures drawn in the browser). No
 * page may frame Cairn. HSTS and upgrading requests only make sense when the server is reached over https.
 */
export function securityHeaders(ctx: ServerContext): RequestHandler[] {
  const https = ctx.config.publicUrl.startsWith('https:');
  return [
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: [SELF],
          scriptSrc: [SELF],
          scriptSrcAttr: [NONE],
          styleSrc: [SELF],
          // Vite inlines the smallest font files into the stylesheet as data: URLs.
          fontSrc: [SELF, 'data:'],
          imgSrc: [SELF, 'data:', 'blob:'],
          connectSrc: [SELF],
          objectSrc: [NONE],
          baseUri: [SELF],
          formAction: [SELF],
          frameAncestors: [NONE],
          ...(https ? { upgradeInsecureRequests: [] } : {}),
        },
      },
      xFrameOptions: { action: 'deny' },
      strictTransportSecurity: https ? { maxAge: 180 * 24 * 3600, includeSubDomains: true } : false,
    }),
  ];
}

const WINDOW_MS = 60_000;

/**
 * Rate limits on /api, after authentication so a key is known: per API key (its id) for scripts, per
 * address for everyone else; ctx.config.rateLimitPerMinute requests a minute, announced in the standard
 * RateLimit headers. Health checks are exempt: monitors poll them.
 */
export function rateLimits(ctx: ServerContext): RequestHandler[] {
  return [
    rateLimit({
      windowMs: WINDOW_MS,
      limit: ctx.config.rateLimitPerMinute,
      standardHeaders: 'draft-8',
      identifier: 'cairn-api',
      legacyHeaders: false,
      skip: (req) => req.originalUrl.split('?')[0] === '/api/health',
      keyGenerator: (req) => (req.actor?.kind === 'key' ? `key:${req.actor.key.id}` : `address:${ipKeyGenerator(req.ip ?? 'unknown')}`),
      handler: (req, res) => {
        const reset = (req as AugmentedRequest).rateLimit?.resetTime;
        const retryAfterSeconds = Math.max(1, reset ? Math.ceil((reset.getTime() - Date.now()) / 1000) : Math.ceil(WINDOW_MS / 1000));
        const who = req.actor?.kind === 'key' ? 'this API key' : 'this address';
        const body: ApiError = {
          error: {
            code: 'rate_limited',
            message: `too many requests: ${who} may make ${ctx.config.rateLimitPerMinute} a minute; try again in ${retryAfterSeconds} s`,
            details: { retryAfterSeconds },
          },
        };
        res.status(429).json(body);
      },
    }),
  ];
}
