import type { MeResponse } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { insertMemberWithKey } from './support/test-key';
import { signInAs, startSignInApp, type SignedIn, type SignInApp } from './support/sign-in';

// Synchronizer-token CSRF defence (OWASP CSRF Prevention Cheat Sheet, common practice): a write made with
// the session cookie must echo a per-session secret that another site's page cannot read.
let tdb: TestDatabase;
let app: SignInApp;
let member: SignedIn;

beforeAll(async () => {
  tdb = await createTestDatabase('auth_csrf');
  app = await startSignInApp(tdb.db);
  member = await signInAs(app.url, 'tobias-quell');
});
afterAll(async () => {
  await app.close();
  await tdb.drop();
});

const patchMe = (headers: Record<string, string>, notifyOnFinish: boolean) =>
  fetch(`${app.url}/api/v1/me`, { method: 'PATCH', headers: { 'content-type': 'application/json', ...headers }, body: JSON.stringify({ notifyOnFinish }) });
const notifySetting = async (userId: string) =>
  ((await (await tdb.db.connect()).query(`SELECT notify_on_finish FROM users WHERE id = $1`, [userId])) as { notify_on_finish: boolean }[])[0]!.notify_on_finish;

describe('CSRF on cookie-authenticated writes', () => {
  it('refuses a cookie write without the token and changes nothing', async () => {
    const res = await patchMe({ cookie: member.cookie }, false);
    expect(res.status).toBe(403);
    const body = (await res.json()) as { error: { code: string; message: string } };
    expect(body.error.code).toBe('csrf');
    expect(body.error.message).toMatch(/X-CSRF-Token/);
    expect(await notifySetting(member.me.user!.id)).toBe(true);
  });

  it('refuses a cookie write with a wrong token, including another session’s', async () => {
    expect((await patchMe({ cookie: member.cookie, 'x-csrf-token': 'not-the-token' }, false)).status).toBe(403);
    expect((await patchMe({ cookie: member.cookie, 'x-csrf-token': `${member.csrfToken}x` }, false)).status).toBe(403);
    const other = await signInAs(app.url, 'wren-adeyemi');
    expect(other.csrfToken).not.toBe(member.csrfToken);
    expect((await patchMe({ cookie: member.cookie, 'x-csrf-token': other.csrfToken }, false)).status).toBe(403);
    expect(await notifySetting(member.me.user!.id)).toBe(true);
  });

  it('accepts a cookie write with the right token', async () => {
    const res = await patchMe({ cookie: member.cookie, 'x-csrf-token': member.csrfToken }, false);
    expect(res.status).toBe(200);
    expect(await notifySetting(member.me.user!.id)).toBe(false);
  });

  it('keeps the token for the life of the session', async () => {
    const again = (await (await fetch(`${app.url}/api/v1/me`, { headers: { cookie: member.cookie } })).json()) as MeResponse;
    expect(again.csrfToken).toBe(member.csrfToken);
  });

  it('checks cookie writes on any API path, before the route is even looked up', async () => {
    const res = await fetch(`${app.url}/api/v1/no-such-route`, { method: 'DELETE', headers: { cookie: member.cookie } });
    expect(res.status).toBe(403);
    expect(((await res.json()) as { error: { code: string } }).error.code).toBe('csrf');
  });

  it('needs no token for a write with an API key, which carries no cookie authority', async () => {
    const keyed = await insertMemberWithKey(await tdb.db.connect(), 'script-runner', 'researcher', ['runs:read']);
    const res = await patchMe({ authorization: keyed.authorization }, false);
    expect(res.status).toBe(200);
    expect(((await res.json()) as MeResponse).via).toBe('key');
    expect(await notifySetting(keyed.userId)).toBe(false);
    // A key request is judged by its key alone: a session cookie beside it lends nothing and needs no token.
    const both = await patchMe({ authorization: keyed.authorization, cookie: member.cookie }, true);
    expect(both.status).toBe(200);
    expect(((await both.json()) as MeResponse).user!.login).toBe('script-runner');
    expect(await notifySetting(member.me.user!.id)).toBe(false);
  });

  it('lets reads through without a token', async () => {
    expect((await fetch(`${app.url}/api/v1/me`, { headers: { cookie: member.cookie } })).status).toBe(200);
  });
});
