import { MeResponse, MeUpdateRequest, SignInCallbackQuery, SignInStartQuery } from '@cairn/schema';
import { Router, type NextFunction, type Request, type Response } from 'express';
import type { AuthenticateCallback } from 'passport';
import type { AppContext } from '../app';
import { actorUser, permissionsOf } from '../auth/actor';
import { newCsrfToken } from '../auth/csrf';
import { connectOrUnavailable } from '../db/connect-or-unavailable';
import { githubSignIn } from '../auth/github-sign-in';
import { actorOf, requirePermission, requireUser } from '../auth/require';
import { SESSION_COOKIE, sessionCookieOptions } from '../auth/session';
import { afterSignInPath } from '../auth/sign-in-redirect';
import type { User } from '../entities/user.entity';
import { HttpError } from '../http/errors';
import { parseBody, parseQuery } from '../http/validate';
import { documentRoute } from '../openapi/route-docs';
import { signedInMemberView, updateMemberSettings } from '../services/members';

/** Sign-in through GitHub (or the local stand-in), sign-out, and the caller's own view: GET/PATCH /me. */
export function authRouter(ctx: AppContext): Router {
  const router = Router();
  const authenticator = ctx.signIn ? githubSignIn(ctx, ctx.signIn) : undefined;

  const signInAvailable = (req: Request) => {
    if (!authenticator) throw new HttpError(503, 'sign_in_unavailable', 'sign-in is not configured on this server (no GitHub credentials and no local provider)');
    if (!req.session) throw new HttpError(400, 'bad_request', 'sign-in happens in a browser session; send no Authorization header');
    return authenticator;
  };

  documentRoute({ method: 'get', path: '/api/v1/auth/github', tag: 'auth', summary: 'Start sign-in: redirects to the provider; `next` is where to land afterwards', needs: 'none', query: SignInStartQuery, status: 302 });
  router.get('/auth/github', (req, res, next) => {
    const auth = signInAvailable(req);
    const { next: landing } = parseQuery(SignInStartQuery, req);
    if (landing) req.session.signInNext = landing;
    else delete req.session.signInNext;
    auth.authenticate('github', { session: false })(req, res, next);
  });

  documentRoute({ method: 'get', path: '/api/v1/auth/github/callback', tag: 'auth', summary: 'Where the provider sends the browser back; signs in and redirects', needs: 'none', query: SignInCallbackQuery, status: 302 });
  router.get('/auth/github/callback', (req, res, next) => {
    const auth = signInAvailable(req);
    parseQuery(SignInCallbackQuery, req);
    const done: AuthenticateCallback = (err, user, info) => {
      if (err) return next(signInError(ctx, err));
      if (!user) return next(new HttpError(403, 'sign_in_failed', `sign-in failed: ${messageOf(info)}`));
      completeSignIn(ctx, req, res, next, user as User);
    };
    auth.authenticate('github', { session: false }, done)(req, res, next);
  });

  documentRoute({ method: 'post', path: '/api/v1/auth/sign-out', tag: 'auth', summary: 'End the session (needs X-CSRF-Token)', needs: 'none', status: 204 });
  router.post('/auth/sign-out', (req, res, next) => {
    const cleared = () => res.clearCookie(SESSION_COOKIE, sessionCookieOptions(ctx)).status(204).end();
    if (!req.session) return cleared();
    req.session.destroy((err) => (err ? next(storeError(ctx, err)) : cleared()));
  });

  documentRoute({ method: 'get', path: '/api/v1/me', tag: 'auth', summary: 'Who is calling, how, what they may do, and the CSRF token of the session', needs: 'none', response: MeResponse });
  router.get('/me', (req, res) => {
    res.set('Cache-Control', 'no-store').json(meResponse(ctx, req));
  });

  documentRoute({ method: 'patch', path: '/api/v1/me', tag: 'auth', summary: "Change one's own settings (run-finished e-mails)", needs: 'runs:read', body: MeUpdateRequest, response: MeResponse });
  router.patch('/me', requirePermission('runs:read'), async (req, res) => {
    const user = requireUser(req);
    const change = parseBody(MeUpdateRequest, req);
    const updated = await updateMemberSettings(await connectOrUnavailable(ctx.db), user.id, change);
    const actor = actorOf(req);
    if (actor.kind !== 'anonymous') actor.user = updated;
    res.json(meResponse(ctx, req));
  });

  return router;
}

/** The caller as GET /me shows them; a session made before CSRF tokens existed gets one now. */
function meResponse(ctx: AppContext, req: Request): MeResponse {
  const actor = actorOf(req);
  const user = actorUser(actor);
  let csrfToken: string | null = null;
  if (actor.kind === 'session') csrfToken = req.session.csrfToken ??= newCsrfToken();
  return {
    user: user ? signedInMemberView(user) : null,
    via: actor.kind === 'anonymous' ? null : actor.kind,
    permissions: [...permissionsOf(actor)].sort(),
    csrfToken,
    signIn: ctx.signIn ? { provider: ctx.signIn.name } : null,
  };
}

/** A fresh session for the member (against session fixation), with its own CSRF token; then on to `next`. */
function completeSignIn(ctx: AppContext, req: Request, res: Response, next: NextFunction, user: User): void {
  const landing = afterSignInPath(req.session.signInNext);
  req.session.regenerate((err) => {
    if (err) return next(storeError(ctx, err));
    req.session.userId = user.id;
    req.session.csrfToken = newCsrfToken();
    req.session.save((saveErr) => {
      if (saveErr) return next(storeError(ctx, saveErr));
      res.redirect(302, landing);
    });
  });
}

function messageOf(info: unknown): string {
  if (typeof info === 'string' && info) return info;
  if (info && typeof info === 'object' && 'message' in info && typeof info.message === 'string') return info.message;
  return 'the sign-in was not completed';
}

/** The provider refused (a bad or reused code, a denied grant): 403; it failed to answer: 502. */
function signInError(ctx: AppContext, err: unknown): HttpError {
  if (err instanceof HttpError) return err;
  const name = err instanceof Error ? err.name : '';
  if (name === 'TokenError' || name === 'AuthorizationError') {
    return new HttpError(403, 'sign_in_failed', `sign-in failed: ${(err as Error).message}`);
  }
  ctx.logger.warn({ err }, 'sign-in provider failed');
  return new HttpError(502, 'sign_in_provider_failed', 'the sign-in provider did not answer as expected; try again');
}

function storeError(ctx: AppContext, err: unknown): HttpError {
  ctx.logger.warn({ err }, 'session store failed');
  return new HttpError(503, 'database_unavailable', 'the session store does not answer; try again shortly');
}
