import { sessionCookieOf, signInThroughLocalProvider } from '../support/local-sign-in';
import type { ApiKeyCreatedResponse, MeResponse } from '@cairn/schema';
import { createDataSource, createLogger, Database, loadDemoData } from '@cairn/server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startBuiltServer, type BuiltServer } from '../support/built-server';
import { databaseUrl } from '../support/test-env';

// The built server (node apps/server/dist/main.js) with its own local sign-in provider, signing in the
// way a browser does: app → provider page → chosen identity → app callback. Build first:
// cd apps/server && pnpm -s build.
let server: BuiltServer;
let db: Database;

beforeAll(async () => {
  db = new Database(createDataSource(databaseUrl()), createLogger('silent'));
  await loadDemoData(await db.connect());
  server = await startBuiltServer({}, { publicUrlIsOwn: true });
});
afterAll(async () => {
  await server?.stop();
  await db?.close();
});

const cookieOf = sessionCookieOf;

async function signIn(login: string, next?: string): Promise<{ cookie: string; landing: string; me: MeResponse }> {
  const done = await signInThroughLocalProvider(server.url, login, next);
  const cookie = cookieOf(done)!;
  const me = (await (await fetch(`${server.url}/api/v1/me`, { headers: { cookie } })).json()) as MeResponse;
  return { cookie, landing: done.headers.get('location')!, me };
}

describe('sign-in on the built server', () => {
  it('signs a demo member in through the local provider with the role the demo data gives', async () => {
    const tobias = await signIn('tobias-quell', '/runs');
    expect(tobias.landing).toBe('/runs');
    expect(tobias.me).toMatchObject({ via: 'session', user: { login: 'tobias-quell', displayName: 'Tobias Quell', role: 'researcher' }, signIn: { provider: 'local' } });
    const sid = /^s:(.+)\.[^.]+$/.exec(decodeURIComponent(tobias.cookie.slice('cairn.sid='.length)))![1]!;
    const rows = (await (await db.connect()).query(`SELECT sess FROM sessions WHERE sid = $1`, [sid])) as { sess: { userId: string } }[];
    expect(rows[0]!.sess.userId).toBe(tobias.me.user!.id);
  });

  it('lets the demo admin make a key (with the CSRF token) that then works as Bearer, and signs out', async () => {
    const ines = await signIn('ines-marlow');
    expect(ines.me.user!.role).toBe('admin');
    const tobiasId = ((await (await db.connect()).query(`SELECT id FROM users WHERE login = 'tobias-quell'`)) as { id: string }[])[0]!.id;
    const body = JSON.stringify({ userId: tobiasId, name: 'integration', scopes: ['runs:read'] });
    const headers = { cookie: ines.cookie, 'content-type': 'application/json' };
    const refused = await fetch(`${server.url}/api/v1/keys`, { method: 'POST', headers, body });
    expect(refused.status).toBe(403);
    await refused.text();
    const made = await fetch(`${server.url}/api/v1/keys`, { method: 'POST', headers: { ...headers, 'x-csrf-token': ines.me.csrfToken! }, body });
    expect(made.status).toBe(201);
    const { secret } = (await made.json()) as ApiKeyCreatedResponse;
    const byKey = (await (await fetch(`${server.url}/api/v1/me`, { headers: { authorization: `Bearer ${secret}` } })).json()) as MeResponse;
    expect(byKey).toMatchObject({ via: 'key', user: { login: 'tobias-quell' }, permissions: ['runs:read'] });

    const out = await fetch(`${server.url}/api/v1/auth/sign-out`, { method: 'POST', headers: { cookie: ines.cookie, 'x-csrf-token': ines.me.csrfToken! } });
    expect(out.status).toBe(204);
    const after = (await (await fetch(`${server.url}/api/v1/me`, { headers: { cookie: ines.cookie } })).json()) as MeResponse;
    expect(after.user).toBeNull();
  });

  it('shuts down cleanly with its session store open', async () => {
    expect(await server.stop()).toBe(0);
  });
});
