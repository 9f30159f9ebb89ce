import { randomBytes } from 'node:crypto';
import express, { type Express, type Request } from 'express';
import type { DemoIdentity } from './demo-identities';

export interface FakeGithubOptions {
  identities: readonly DemoIdentity[];
  clientId: string;
  clientSecret: string;
}

interface PendingCode {
  identity: DemoIdentity;
  clientId: string;
  redirectUri: string;
  scope: string;
  expires: number;
}

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** Redirects may only go back to this machine: the fake provider never sends anyone elsewhere. */
function isLoopbackUrl(raw: string): boolean {
  try {
    const url = new URL(raw);
    return url.protocol === 'http:' && ['127.0.0.1', 'localhost', '[::1]'].includes(url.hostname);
  } catch {
    return false;
  }
}

/**
 * A local stand-in for GitHub's OAuth web flow and user API, speaking the same protocol
 * (GET/POST /login/oauth/authorize, POST /login/oauth/access_token, GET /user, GET /user/emails),
 * where the person picks one of the demo identities instead of typing a password.
 */
export function createFakeGithub({ identities, clientId, clientSecret }: FakeGithubOptions): Express {
  const codes = new Map<string, PendingCode>();
  const tokens = new Map<string, { identity: DemoIdentity; scope: string }>();
  const app = express();
  app.disable('x-powered-by');
  app.use(express.urlencoded({ extended: false }));
  app.use(express.json());

  app.get('/login/oauth/authorize', (req, res) => {
    const q = req.query as Record<string, string | undefined>;
    if (q.client_id !== clientId) return res.status(400).type('text/plain').send('unknown client_id');
    if (!q.redirect_uri || !isLoopbackUrl(q.redirect_uri)) {
      return res.status(400).type('text/plain').send('redirect_uri must be an http URL on this machine');
    }
    const hidden = (name: string, value: string | undefined) =>
      `<input type="hidden" name="${name}" value="${escapeHtml(value ?? '')}">`;
    const choices = identities
      .map(
        (i) => `<form method="post" action="/login/oauth/authorize">
  ${hidden('client_id', q.client_id)}${hidden('redirect_uri', q.redirect_uri)}${hidden('state', q.state)}${hidden('scope', q.scope)}${hidden('login', i.login)}
  <button type="submit" data-login="${escapeHtml(i.login)}"><strong>${escapeHtml(i.name)}</strong> · ${escapeHtml(i.login)} · ${escapeHtml(i.role)}<br><small>${escapeHtml(i.about)}</small></button>
</form>`,
      )
      .join('\n');
    res.type('html').send(`<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Local sign-in</title>
<style>body{font:16px system-ui,sans-serif;max-width:34rem;margin:3rem auto;color:#1d2a2a}button{display:block;width:100%;text-align:left;margin:.5rem 0;padding:.8rem 1rem;border:1px solid #8aa39b;border-radius:.5rem;background:#f4f1ea;cursor:pointer}</style>
</head><body><h1>Local sign-in</h1><p>This stand-in for GitHub runs on your machine. Choose who you are:</p>${choices}</body></html>`);
  });

  app.post('/login/oauth/authorize', (req, res) => {
    const b = req.body as Record<string, string | undefined>;
    const identity = identities.find((i) => i.login === b.login);
    if (b.client_id !== clientId || !identity || !b.redirect_uri || !isLoopbackUrl(b.redirect_uri)) {
      return res.status(400).type('text/plain').send('bad sign-in request');
    }
    const code = randomBytes(16).toString('hex');
    codes.set(code, { identity, clientId, redirectUri: b.redirect_uri, scope: b.scope ?? '', expires: Date.now() + 10 * 60_000 });
    const target = new URL(b.redirect_uri);
    target.searchParams.set('code', code);
    if (b.state) target.searchParams.set('state', b.state);
    res.redirect(302, target.toString());
  });

  app.post('/login/oauth/access_token', (req, res) => {
    const b = { ...(req.query as Record<string, string | undefined>), ...(req.body as Record<string, string | undefined>) };
    const answer = (body: Record<string, string>) => {
      if (req.accepts(['application/x-www-form-urlencoded', 'application/json']) === 'application/json') res.json(body);
      else res.type('application/x-www-form-urlencoded').send(new URLSearchParams(body).toString());
    };
    if (b.client_id !== clientId || b.client_secret !== clientSecret) {
      return answer({ error: 'incorrect_client_credentials', error_description: 'The client_id and/or client_secret passed are incorrect.' });
    }
    const pending = b.code ? codes.get(b.code) : undefined;
    if (b.code) codes.delete(b.code); // a code is good once
    if (!pending || pending.expires < Date.now() || (b.redirect_uri && b.redirect_uri !== pending.redirectUri)) {
      return answer({ error: 'bad_verification_code', error_description: 'The code passed is incorrect or expired.' });
    }
    const token = `fake_${randomBytes(20).toString('hex')}`;
    tokens.set(token, { identity: pending.identity, scope: pending.scope });
    answer({ access_token: token, token_type: 'bearer', scope: pending.scope });
  });

  const bearer = (req: Request) => {
    const m = /^(?:token|bearer)\s+(\S+)$/i.exec(req.get('authorization') ?? '');
    return m ? tokens.get(m[1]!) : undefined;
  };

  app.get('/user', (req, res) => {
    const grant = bearer(req);
    if (!grant) return res.status(401).json({ message: 'Requires authentication' });
    const i = grant.identity;
    res.json({ login: i.login, id: i.githubId, node_id: `U_fake${i.githubId}`, type: 'User', name: i.name, email: i.email, avatar_url: null, html_url: null });
  });

  app.get('/user/emails', (req, res) => {
    const grant = bearer(req);
    if (!grant) return res.status(401).json({ message: 'Requires authentication' });
    // As on GitHub, the e-mail list needs the user or user:email scope.
    const scopes = grant.scope.split(/[\s,]+/);
    if (!scopes.includes('user') && !scopes.includes('user:email')) return res.status(404).json({ message: 'Not Found' });
    res.json([{ email: grant.identity.email, primary: true, verified: true, visibility: 'private' }]);
  });

  return app;
}
