import type { MeResponse } from '@cairn/schema';
import type { Express } from 'express';
import { createApp, type AppContext } from '../../src/app';
import { closeAuth } from '../../src/auth/install-auth';
import { signInProvider } from '../../src/auth/sign-in-provider';
import type { Database } from '../../src/db/database';
import { startDevServices, type DevServices } from '../../src/dev/dev-services';
import { createLogger } from '../../src/logger';
import { listenOnLoopback } from './listen';
import { testContext } from './test-context';

/** An app under test whose sign-in goes through the real local provider (both on loopback, port 0). */
export interface SignInApp {
  url: string;
  app: Express;
  ctx: AppContext;
  dev: DevServices;
  close(): Promise<void>;
}

/**
 * Starts the local stand-ins and the app, with the app's public URL set to where it really listens (the
 * provider redirects back there). `env` and `overrides` go to testContext.
 */
export async function startSignInApp(db: Database, env: Record<string, string> = {}, overrides: Partial<AppContext> = {}): Promise<SignInApp> {
  const dev = await startDevServices('127.0.0.1', 0, 0, createLogger('silent'));
  const { url, server, close } = await listenOnLoopback();
  const base = testContext(db, overrides, { CAIRN_PUBLIC_URL: url, ...env });
  // `signIn: undefined` in the overrides asks for an app without sign-in.
  const ctx: AppContext = { ...base, signIn: 'signIn' in overrides ? overrides.signIn : signInProvider(base.config, dev.url) };
  const app = createApp(ctx);
  server.on('request', app);
  return {
    url,
    app,
    ctx,
    dev,
    close: async () => {
      await close();
      await closeAuth(app);
      await dev.close();
    },
  };
}

/** The `name=value` of the session cookie a response sets, if it sets one. */
export function sessionCookieOf(res: Response): string | undefined {
  for (const line of res.headers.getSetCookie()) {
    const pair = line.split(';', 1)[0]!;
    if (pair.startsWith('cairn.sid=')) return pair;
  }
  return undefined;
}

const unescapeHtml = (s: string) => s.replace(/&(amp|lt|gt|quot|#39);/g, (_m, e: string) => ({ amp: '&', lt: '<', gt: '>', quot: '"', '#39': "'" })[e]!);

/** Step 1: the app sends the browser to the provider and sets the session cookie that holds the state. */
export async function startSignIn(appUrl: string, next?: string): Promise<{ cookie: string; authorizeUrl: string }> {
  const res = await fetch(`${appUrl}/api/v1/auth/github${next === undefined ? '' : `?next=${encodeURIComponent(next)}`}`, { redirect: 'manual' });
  if (res.status !== 302) throw new Error(`sign-in start answered ${res.status}: ${await res.text()}`);
  const cookie = sessionCookieOf(res);
  if (!cookie) throw new Error('sign-in start set no session cookie');
  return { cookie, authorizeUrl: res.headers.get('location')! };
}

/**
 * Step 2, as a person does it: open the provider's page, pick the identity's form and submit it. Returns
 * where the provider sends the browser back (the app's callback with code and state).
 */
export async function chooseIdentity(authorizeUrl: string, login: string): Promise<string> {
  const page = await fetch(authorizeUrl);
  const html = await page.text();
  if (page.status !== 200) throw new Error(`the provider's page answered ${page.status}: ${html}`);
  const form = html.split('</form>').find((f) => f.includes(`data-login="${login}"`));
  if (!form) throw new Error(`the provider does not offer ${login}`);
  const fields = new URLSearchParams();
  for (const m of form.matchAll(/<input type="hidden" name="([^"]+)" value="([^"]*)">/g)) fields.set(m[1]!, unescapeHtml(m[2]!));
  const action = new URL(/<form method="post" action="([^"]+)"/.exec(form)![1]!, authorizeUrl);
  const res = await fetch(action, { method: 'POST', body: fields, redirect: 'manual' });
  if (res.status !== 302) throw new Error(`choosing ${login} answered ${res.status}: ${await res.text()}`);
  return res.headers.get('location')!;
}

/** Step 3: the browser comes back to the app with its cookie; the app signs in and redirects. */
export async function finishSignIn(callbackUrl: string, cookie: string): Promise<Response> {
  return fetch(callbackUrl, { headers: { cookie }, redirect: 'manual' });
}

export interface SignedIn {
  /** `cairn.sid=…`, to send as the Cookie header. */
  cookie: string;
  csrfToken: string;
  me: MeResponse;
  /** fetch against the app with the cookie and, on writes, the CSRF header (a path like /api/v1/runs). */
  fetch(path: string, init?: RequestInit): Promise<Response>;
}

/**
 * Signs in as one of the provider's demo identities through the whole round trip (app → provider page →
 * chosen identity → app callback), the way a browser does, and returns a client for the session. The app
 * must be configured with the local provider (startSignInApp does that).
 */
export async function signInAs(appUrl: string, login: string): Promise<SignedIn> {
  const start = await startSignIn(appUrl);
  const callback = await chooseIdentity(start.authorizeUrl, login);
  const done = await finishSignIn(callback, start.cookie);
  if (done.status !== 302) throw new Error(`sign-in callback answered ${done.status}: ${await done.text()}`);
  const cookie = sessionCookieOf(done);
  if (!cookie) throw new Error('sign-in set no new session cookie');
  const meRes = await fetch(`${appUrl}/api/v1/me`, { headers: { cookie } });
  const me = (await meRes.json()) as MeResponse;
  if (!me.user || !me.csrfToken) throw new Error(`not signed in after the round trip: ${JSON.stringify(me)}`);
  const csrfToken = me.csrfToken;
  return {
    cookie,
    csrfToken,
    me,
    fetch: (path, init = {}) => {
      const headers = new Headers(init.headers);
      headers.set('cookie', cookie);
      const method = (init.method ?? 'GET').toUpperCase();
      if (!['GET', 'HEAD', 'OPTIONS'].includes(method) && !headers.has('x-csrf-token')) headers.set('x-csrf-token', csrfToken);
      if (typeof init.body === 'string' && !headers.has('content-type')) headers.set('content-type', 'application/json');
      return fetch(new URL(path, appUrl), { redirect: 'manual', ...init, headers });
    },
  };
}
