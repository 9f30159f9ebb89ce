import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoIdentities, LOCAL_CLIENT_ID, LOCAL_CLIENT_SECRET } from '../src/index';
import { createFakeGithub } from '../src/dev/fake-github';
import { listenOnLoopback, type Listening } from './support/listen';

let server: Listening;
let base: string;

beforeAll(async () => {
  server = await listenOnLoopback(createFakeGithub({ identities: demoIdentities, clientId: LOCAL_CLIENT_ID, clientSecret: LOCAL_CLIENT_SECRET }));
  base = server.url;
});
afterAll(() => server?.close());

const callback = 'http://127.0.0.1:9/auth/github/callback';

async function authorize(login: string, scope = 'user:email'): Promise<string> {
  const form = new URLSearchParams({ client_id: LOCAL_CLIENT_ID, redirect_uri: callback, state: 'st4te', scope, login });
  const res = await fetch(`${base}/login/oauth/authorize`, { method: 'POST', body: form, redirect: 'manual' });
  expect(res.status).toBe(302);
  const location = new URL(res.headers.get('location')!);
  expect(`${location.origin}${location.pathname}`).toBe(callback);
  expect(location.searchParams.get('state')).toBe('st4te');
  return location.searchParams.get('code')!;
}

async function exchange(code: string, secret = LOCAL_CLIENT_SECRET) {
  const form = new URLSearchParams({ client_id: LOCAL_CLIENT_ID, client_secret: secret, code, redirect_uri: callback });
  const res = await fetch(`${base}/login/oauth/access_token`, { method: 'POST', body: form, headers: { accept: 'application/json' } });
  return (await res.json()) as Record<string, string>;
}

// The steps and answer shapes follow GitHub's documented OAuth web application flow (common practice
// for OAuth 2.0, RFC 6749 section 4.1).
describe('local sign-in provider', () => {
  it('offers every demo identity on the authorize page', async () => {
    const url = `${base}/login/oauth/authorize?client_id=${LOCAL_CLIENT_ID}&redirect_uri=${encodeURIComponent(callback)}&state=x`;
    const html = await (await fetch(url)).text();
    for (const i of demoIdentities) expect(html).toContain(`data-login="${i.login}"`);
  });

  it('runs the whole flow: code, token, user and e-mails', async () => {
    const code = await authorize('tobias-quell');
    const token = await exchange(code);
    expect(token).toMatchObject({ token_type: 'bearer', scope: 'user:email' });
    const headers = { authorization: `token ${token.access_token}` };
    const user = (await (await fetch(`${base}/user`, { headers })).json()) as { login: string; id: number };
    expect(user).toMatchObject({ login: 'tobias-quell', id: 7100002 });
    const emails = (await (await fetch(`${base}/user/emails`, { headers })).json()) as { email: string; primary: boolean }[];
    expect(emails).toEqual([expect.objectContaining({ email: 'tobias@tollgate-lattice.example', primary: true, verified: true })]);
  });

  it('answers the form encoding when JSON is not asked for', async () => {
    const code = await authorize('ines-marlow');
    const form = new URLSearchParams({ client_id: LOCAL_CLIENT_ID, client_secret: LOCAL_CLIENT_SECRET, code });
    const res = await fetch(`${base}/login/oauth/access_token`, { method: 'POST', body: form });
    expect(res.headers.get('content-type')).toMatch(/x-www-form-urlencoded/);
    expect(new URLSearchParams(await res.text()).get('token_type')).toBe('bearer');
  });

  it('takes a code once, checks the client secret, and refuses unknown tokens', async () => {
    const code = await authorize('wren-adeyemi');
    expect(await exchange(code, 'wrong')).toMatchObject({ error: 'incorrect_client_credentials' });
    const again = await authorize('wren-adeyemi');
    expect((await exchange(again)).access_token).toBeTruthy();
    expect(await exchange(again)).toMatchObject({ error: 'bad_verification_code' });
    expect((await fetch(`${base}/user`, { headers: { authorization: 'token nope' } })).status).toBe(401);
  });

  it('hides e-mails without the user:email scope and never redirects off this machine', async () => {
    const token = await exchange(await authorize('guest-reader', 'read:org'));
    expect((await fetch(`${base}/user/emails`, { headers: { authorization: `Bearer ${token.access_token}` } })).status).toBe(404);
    const far = `${base}/login/oauth/authorize?client_id=${LOCAL_CLIENT_ID}&redirect_uri=${encodeURIComponent('https://example.org/cb')}`;
    expect((await fetch(far)).status).toBe(400);
  });
});
