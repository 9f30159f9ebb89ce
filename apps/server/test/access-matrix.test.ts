import { randomUUID } from 'node:crypto';
import type { ApiScope } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadDemoData } from '../src/index';
import { documentedRoutes } from '../src/openapi/route-docs';
import { signInAs, startSignInApp, type SignInApp } from './support/sign-in';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { insertMemberWithKey } from './support/test-key';

/**
 * Who may call what, written out here by hand from the role rules (not read from the code):
 * viewers read public runs and the atlas; researchers also create runs, sweeps and uploads; admins also
 * manage members and keys; a key acts as its owner narrowed to its scopes and never manages keys.
 */
type Needs = 'anyone' | 'atlas' | 'read' | 'write' | 'admin';
const EXPECTED: Record<string, Needs> = {
  'GET /api/v1/me': 'anyone',
  'PATCH /api/v1/me': 'read',
  'GET /api/v1/openapi.json': 'anyone',
  'GET /api/v1/auth/github': 'anyone',
  'GET /api/v1/atlas': 'atlas',
  'GET /api/v1/atlas/:key': 'atlas',
  'GET /api/v1/quick': 'atlas',
  'GET /api/v1/shared/:token': 'anyone',
  'GET /api/v1/shared/:token/export': 'anyone',
  'GET /api/v1/shared/:token/plan': 'anyone',
  'GET /api/v1/runs': 'read',
  'GET /api/v1/runs/:id': 'read',
  'GET /api/v1/runs/:id/events': 'read',
  'GET /api/v1/runs/:id/export': 'read',
  'GET /api/v1/runs/:id/plan': 'read',
  'POST /api/v1/runs': 'write',
  'PATCH /api/v1/runs/:id': 'write',
  'DELETE /api/v1/runs/:id': 'write',
  'POST /api/v1/runs/:id/cancel': 'write',
  'POST /api/v1/runs/:id/share': 'write',
  'GET /api/v1/sweeps': 'read',
  'GET /api/v1/sweeps/:id': 'read',
  'GET /api/v1/sweeps/:id/export': 'read',
  'POST /api/v1/sweeps': 'write',
  'GET /api/v1/graphs': 'read',
  'GET /api/v1/graphs/:id': 'read',
  'GET /api/v1/graphs/:id/content': 'read',
  'POST /api/v1/graphs': 'write',
  'DELETE /api/v1/graphs/:id': 'write',
  'POST /api/v1/verify': 'write',
  'GET /api/v1/users': 'admin',
  'PATCH /api/v1/users/:id': 'admin',
  'GET /api/v1/keys': 'admin',
  'POST /api/v1/keys': 'admin',
  'DELETE /api/v1/keys/:id': 'admin',
  'GET /api/v1/dev/mail': 'admin',
  // Last: it ends the sessions the rows above use.
  'POST /api/v1/auth/sign-out': 'anyone',
};
// The sign-in callback is the provider's to call; its refusals are checked in auth-sign-in.test.ts.
const NOT_IN_MATRIX = new Set(['GET /api/v1/auth/github/callback']);

interface Caller {
  name: string;
  role: 'anonymous' | 'viewer' | 'researcher' | 'admin';
  /** Undefined for sessions and anonymous callers. */
  scopes?: ApiScope[];
  call: (path: string, init: RequestInit) => Promise<Response>;
}

const SCOPE_OF: Record<Exclude<Needs, 'anyone' | 'admin'>, ApiScope> = { atlas: 'atlas:read', read: 'runs:read', write: 'runs:write' };

/** 'allowed', or the status a refusal must have. */
function expectation(needs: Needs, caller: Caller): 'allowed' | 401 | 403 {
  if (needs === 'anyone') return 'allowed';
  if (caller.role === 'anonymous') return needs === 'atlas' ? 'allowed' : 401;
  if (needs === 'admin') return caller.role === 'admin' && !caller.scopes ? 'allowed' : 403;
  const roleAllows = needs !== 'write' || caller.role !== 'viewer';
  const scopeAllows = !caller.scopes || caller.scopes.includes(SCOPE_OF[needs]);
  return roleAllows && scopeAllows ? 'allowed' : 403;
}

let t: TestDatabase;
let app: SignInApp;
const callers: Caller[] = [];

beforeAll(async () => {
  t = await createTestDatabase('access_matrix');
  const source = await t.db.connect();
  await loadDemoData(source);
  app = await startSignInApp(t.db, { CAIRN_RATE_LIMIT_PER_MINUTE: '100000' });
  const plain = (path: string, init: RequestInit) => fetch(new URL(path, app.url), { redirect: 'manual', ...init });
  callers.push({ name: 'anonymous', role: 'anonymous', call: plain });
  for (const [login, role] of [
    ['guest-reader', 'viewer'],
    ['tobias-quell', 'researcher'],
    ['ines-marlow', 'admin'],
  ] as const) {
    const s = await signInAs(app.url, login);
    callers.push({ name: `${role} session`, role, call: s.fetch });
  }
  const keyCaller = async (role: 'viewer' | 'researcher' | 'admin', scopes: ApiScope[]) => {
    const k = await insertMemberWithKey(source, `matrix-${role}-${scopes.join('-').replace(/:/g, '_')}`, role, scopes);
    const call = (path: string, init: RequestInit) => {
      const headers = new Headers(init.headers);
      headers.set('authorization', k.authorization);
      return plain(path, { ...init, headers });
    };
    callers.push({ name: `${role} key [${scopes.join(', ')}]`, role, scopes, call });
  };
  for (const scope of ['runs:read', 'runs:write', 'atlas:read'] as const) await keyCaller('researcher', [scope]);
  await keyCaller('researcher', ['runs:read', 'runs:write', 'atlas:read']);
  await keyCaller('viewer', ['runs:read', 'runs:write', 'atlas:read']);
  await keyCaller('admin', ['runs:read', 'runs:write', 'atlas:read']);
}, 60_000);

afterAll(async () => {
  await app?.close();
  await t?.drop();
});

/** A concrete path for a route: ids that exist nowhere, a key, a token of the right shape. */
function concrete(path: string): string {
  return path
    .replace(':id', randomUUID())
    .replace(':key', 'grid%3A4x4')
    .replace(':token', 'no-such-share-token-0000');
}

describe('the role x route matrix', () => {
  it('has an expectation for every documented route', () => {
    const routes = documentedRoutes().map((r) => `${r.method.toUpperCase()} ${r.path}`);
    const missing = routes.filter((r) => !(r in EXPECTED) && !NOT_IN_MATRIX.has(r));
    expect(missing).toEqual([]);
    const gone = Object.keys(EXPECTED).filter((r) => !routes.includes(r));
    expect(gone).toEqual([]);
  });

  it('answers every caller on every route as the role rules say', async () => {
    const wrong: string[] = [];
    for (const [route, needs] of Object.entries(EXPECTED)) {
      const [method, path] = route.split(' ') as [string, string];
      for (const caller of callers) {
        const init: RequestInit = { method };
        if (method !== 'GET' && method !== 'DELETE') {
          init.body = '{}';
          init.headers = { 'content-type': 'application/json' };
        }
        const res = await caller.call(concrete(path) + (path.endsWith('/quick') ? '?spec=path:4' : ''), init);
        await res.body?.cancel();
        const want = expectation(needs, caller);
        const ok = want === 'allowed' ? res.status !== 401 && res.status !== 403 : res.status === want;
        if (!ok) wrong.push(`${route} as ${caller.name}: got ${res.status}, expected ${want === 'allowed' ? 'not 401/403' : want}`);
      }
    }
    expect(wrong).toEqual([]);
  }, 120_000);
});
