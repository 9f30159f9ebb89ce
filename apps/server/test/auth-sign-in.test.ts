import type { MeResponse } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { chooseIdentity, finishSignIn, sessionCookieOf, signInAs, startSignIn, startSignInApp, type SignInApp } from './support/sign-in';

// The OAuth steps are GitHub's documented web application flow (RFC 6749 section 4.1, common practice);
// here they run against Cairn's local stand-in provider, for real, over loopback.
let tdb: TestDatabase;
let app: SignInApp;

beforeAll(async () => {
  tdb = await createTestDatabase('auth_sign_in');
  app = await startSignInApp(tdb.db);
});
afterAll(async () => {
  await app.close();
  await tdb.drop();
});

/** The session id inside a signed `cairn.sid=s%3A<sid>.<signature>` cookie. */
const sidOf = (cookie: string) => /^s:(.+)\.[^.]+$/.exec(decodeURIComponent(cookie.slice('cairn.sid='.length)))![1]!;
const me = async (cookie?: string) => (await (await fetch(`${app.url}/api/v1/me`, { headers: cookie ? { cookie } : {} })).json()) as MeResponse;
const sessionRow = async (sid: string) =>
  ((await (await tdb.db.connect()).query(`SELECT sess, expire FROM sessions WHERE sid = $1`, [sid])) as { sess: Record<string, unknown>; expire: Date }[])[0];

describe('sign-in through the local provider', () => {
  it('answers anonymous callers with no member, the atlas only, and the provider in use', async () => {
    expect(await me()).toEqual({ user: null, via: null, permissions: ['atlas:read'], csrfToken: null, signIn: { provider: 'local' } });
  });

  it('signs the first member in as admin, with a fresh session stored in the sessions table', async () => {
    const start = await startSignIn(app.url);
    const authorize = new URL(start.authorizeUrl);
    expect(`${authorize.origin}${authorize.pathname}`).toBe(`${app.dev.url}/login/oauth/authorize`);
    expect(authorize.searchParams.get('redirect_uri')).toBe(`${app.url}/api/v1/auth/github/callback`);
    expect(authorize.searchParams.get('scope')).toBe('read:user,user:email');
    expect(authorize.searchParams.get('state')).toMatch(/^\w{20,}$/);

    const callback = await chooseIdentity(start.authorizeUrl, 'guest-reader');
    const done = await finishSignIn(callback, start.cookie);
    expect(done.status).toBe(302);
    expect(done.headers.get('location')).toBe('/');
    const cookie = sessionCookieOf(done)!;
    expect(done.headers.getSetCookie().join('\n')).toMatch(/cairn\.sid=.*; Path=\/; Expires=.*; HttpOnly; SameSite=Lax/);

    // A new session id at sign-in (no fixation); the one from before the sign-in is gone from the store.
    expect(sidOf(cookie)).not.toBe(sidOf(start.cookie));
    expect(await sessionRow(sidOf(start.cookie))).toBeUndefined();

    // The guest is a viewer among the demo identities, but nobody had signed in before: admin.
    const who = await me(cookie);
    expect(who.user).toMatchObject({ login: 'guest-reader', displayName: 'Guest Reader', email: 'guest@tollgate-lattice.example', role: 'admin', notifyOnFinish: true });
    expect(who.via).toBe('session');
    expect(who.permissions).toEqual(['admin', 'atlas:read', 'runs:read', 'runs:write']);
    expect(who.csrfToken).toMatch(/^[\w-]{40,}$/);

    const row = await sessionRow(sidOf(cookie));
    expect(row?.sess).toMatchObject({ userId: who.user!.id, csrfToken: who.csrfToken });
    expect(row!.expire.getTime()).toBeGreaterThan(Date.now() + 13 * 24 * 3600_000);
  });

  it('makes later new members viewers and lets existing members keep their role', async () => {
    const tobias = await signInAs(app.url, 'tobias-quell');
    expect(tobias.me.user).toMatchObject({ login: 'tobias-quell', role: 'viewer' });

    const source = await tdb.db.connect();
    await source.query(`UPDATE users SET role = 'researcher', display_name = 'stale name' WHERE login = 'tobias-quell'`);
    const again = await signInAs(app.url, 'tobias-quell');
    // Role kept; what the provider says of the person (name, e-mail) is refreshed.
    expect(again.me.user).toMatchObject({ id: tobias.me.user!.id, role: 'researcher', displayName: 'Tobias Quell' });
    const guest = await signInAs(app.url, 'guest-reader');
    expect(guest.me.user!.role).toBe('admin');
    const count = (await source.query(`SELECT count(*)::int AS n FROM users`)) as { n: number }[];
    expect(count[0]!.n).toBe(2);
  });

  it('makes the configured admin login an admin when it first signs in', async () => {
    const second = await startSignInApp(tdb.db, { CAIRN_ADMIN_LOGIN: 'wren-adeyemi' });
    try {
      expect((await signInAs(second.url, 'wren-adeyemi')).me.user!.role).toBe('admin');
      expect((await signInAs(second.url, 'ines-marlow')).me.user!.role).toBe('viewer');
    } finally {
      await second.close();
    }
  });

  it('lands on the kept `next` path and refuses one that leaves the site', async () => {
    const start = await startSignIn(app.url, '/runs/7f3a?tab=certificate');
    const done = await finishSignIn(await chooseIdentity(start.authorizeUrl, 'tobias-quell'), start.cookie);
    expect(done.status).toBe(302);
    expect(done.headers.get('location')).toBe('/runs/7f3a?tab=certificate');

    for (const next of ['//elsewhere.example/x', 'https://elsewhere.example/', 'runs', '/\\elsewhere.example']) {
      const res = await fetch(`${app.url}/api/v1/auth/github?next=${encodeURIComponent(next)}`, { redirect: 'manual' });
      expect(res.status, next).toBe(400);
      const body = (await res.json()) as { error: { code: string; message: string } };
      expect(body.error.code).toBe('invalid_request');
      expect(body.error.message).toMatch(/^query\.next: /);
    }
  });

  it('refuses a forged state, a callback without the session that started it, and a code used twice', async () => {
    const start = await startSignIn(app.url);
    const callback = new URL(await chooseIdentity(start.authorizeUrl, 'wren-adeyemi'));
    const forged = new URL(callback);
    forged.searchParams.set('state', 'forged-state-of-an-attacker');
    const refused = await finishSignIn(forged.toString(), start.cookie);
    expect(refused.status).toBe(403);
    expect(((await refused.json()) as { error: { code: string } }).error.code).toBe('sign_in_failed');
    expect((await me(start.cookie)).user).toBeNull();

    const other = await startSignIn(app.url);
    const otherCallback = await chooseIdentity(other.authorizeUrl, 'wren-adeyemi');
    const noSession = await fetch(otherCallback, { redirect: 'manual' });
    expect(noSession.status).toBe(403);

    const third = await startSignIn(app.url);
    const thirdCallback = await chooseIdentity(third.authorizeUrl, 'wren-adeyemi');
    const ok = await finishSignIn(thirdCallback, third.cookie);
    expect(ok.status).toBe(302);
    // The same callback again: its state was used up with the old session.
    expect((await finishSignIn(thirdCallback, sessionCookieOf(ok)!)).status).toBe(403);
  });

  it('ends the session on sign-out (which needs the CSRF token) and removes it from the store', async () => {
    const member = await signInAs(app.url, 'tobias-quell');
    const sid = sidOf(member.cookie);
    expect(await sessionRow(sid)).toBeDefined();
    const withoutToken = await fetch(`${app.url}/api/v1/auth/sign-out`, { method: 'POST', headers: { cookie: member.cookie } });
    expect(withoutToken.status).toBe(403);
    expect((await me(member.cookie)).user?.login).toBe('tobias-quell');

    const out = await member.fetch('/api/v1/auth/sign-out', { method: 'POST' });
    expect(out.status).toBe(204);
    expect(out.headers.getSetCookie().join('\n')).toMatch(/cairn\.sid=;.*Expires=Thu, 01 Jan 1970/);
    expect(await sessionRow(sid)).toBeUndefined();
    expect(await me(member.cookie)).toMatchObject({ user: null, via: null, csrfToken: null });
  });

  it('treats a session whose member was deleted as anonymous', async () => {
    const member = await signInAs(app.url, 'ines-marlow');
    await (await tdb.db.connect()).query(`DELETE FROM users WHERE id = $1`, [member.me.user!.id]);
    expect(await me(member.cookie)).toMatchObject({ user: null, via: null, permissions: ['atlas:read'] });
    expect(await sessionRow(sidOf(member.cookie))).toBeUndefined();
  });

  it('changes one’s own mail setting with PATCH /me and names a bad field', async () => {
    const member = await signInAs(app.url, 'wren-adeyemi');
    const off = await member.fetch('/api/v1/me', { method: 'PATCH', body: JSON.stringify({ notifyOnFinish: false }) });
    expect(off.status).toBe(200);
    expect(((await off.json()) as MeResponse).user!.notifyOnFinish).toBe(false);
    expect((await me(member.cookie)).user!.notifyOnFinish).toBe(false);
    const rows = (await (await tdb.db.connect()).query(`SELECT notify_on_finish FROM users WHERE id = $1`, [member.me.user!.id])) as { notify_on_finish: boolean }[];
    expect(rows[0]!.notify_on_finish).toBe(false);

    const bad = await member.fetch('/api/v1/me', { method: 'PATCH', body: JSON.stringify({ notifyOnFinish: 'sometimes' }) });
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as { error: { message: string } }).error.message).toMatch(/^body\.notifyOnFinish: /);
    const anonymous = await fetch(`${app.url}/api/v1/me`, { method: 'PATCH', body: '{"notifyOnFinish":true}', headers: { 'content-type': 'application/json' } });
    expect(anonymous.status).toBe(401);
  });
});

describe('a server without sign-in', () => {
  it('answers the sign-in routes with 503 and says so in /me', async () => {
    const plain = await startSignInApp(tdb.db, {}, { signIn: undefined });
    try {
      for (const path of ['/api/v1/auth/github', '/api/v1/auth/github/callback?code=x&state=y']) {
        const res = await fetch(`${plain.url}${path}`, { redirect: 'manual' });
        expect(res.status, path).toBe(503);
        expect(((await res.json()) as { error: { code: string } }).error.code).toBe('sign_in_unavailable');
      }
      const who = (await (await fetch(`${plain.url}/api/v1/me`)).json()) as MeResponse;
      expect(who.signIn).toBeNull();
    } finally {
      await plain.close();
    }
  });
});
