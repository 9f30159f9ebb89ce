import { createHash } from 'node:crypto';
import type { ApiKeyCreatedResponse, ApiKeyInfo, ApiKeysResponse, MeResponse } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApiKey, KEY_USE_PRECISION_SECONDS } from '../src/services/api-keys';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { insertMemberWithKey } from './support/test-key';
import { signInAs, startSignInApp, type SignedIn, type SignInApp } from './support/sign-in';

let tdb: TestDatabase;
let app: SignInApp;
let admin: SignedIn;
let researcher: SignedIn;
let viewer: SignedIn;

beforeAll(async () => {
  tdb = await createTestDatabase('keys_manage');
  app = await startSignInApp(tdb.db);
  admin = await signInAs(app.url, 'ines-marlow'); // the first member: admin
  researcher = await signInAs(app.url, 'tobias-quell');
  await (await tdb.db.connect()).query(`UPDATE users SET role = 'researcher' WHERE id = $1`, [researcher.me.user!.id]);
  viewer = await signInAs(app.url, 'guest-reader');
});
afterAll(async () => {
  await app.close();
  await tdb.drop();
});

const json = (body: unknown): RequestInit => ({ method: 'POST', body: JSON.stringify(body) });
const errorOf = async (res: Response) => ((await res.json()) as { error: { code: string; message: string } }).error;
const meWith = (authorization: string) => fetch(`${app.url}/api/v1/me`, { headers: { authorization } });

describe('API keys made by an admin', () => {
  it('creates a key whose secret works as Bearer, is stored only as its hash, and is listed by prefix', async () => {
    const res = await admin.fetch('/api/v1/keys', json({ userId: researcher.me.user!.id, name: 'nightly sweeps', scopes: ['runs:read', 'runs:write'] }));
    expect(res.status).toBe(201);
    expect(res.headers.get('cache-control')).toBe('no-store');
    const { key, secret } = (await res.json()) as ApiKeyCreatedResponse;
    expect(secret).toMatch(/^cairn_[A-Za-z0-9_-]{32,}$/);
    expect(key).toMatchObject({ name: 'nightly sweeps', prefix: secret.slice(0, 12), scopes: ['runs:read', 'runs:write'], owner: { id: researcher.me.user!.id, login: 'tobias-quell' }, lastUsedAt: null, revokedAt: null });

    const [row] = (await (await tdb.db.connect()).query(`SELECT secret_hash, prefix, created_by FROM api_keys WHERE id = $1`, [key.id])) as { secret_hash: string; prefix: string; created_by: string }[];
    expect(row).toEqual({ secret_hash: createHash('sha256').update(secret).digest('hex'), prefix: secret.slice(0, 12), created_by: admin.me.user!.id });

    const who = await meWith(`Bearer ${secret}`);
    expect(who.status).toBe(200);
    const me = (await who.json()) as MeResponse;
    expect(me).toMatchObject({ via: 'key', user: { login: 'tobias-quell' }, csrfToken: null, permissions: ['runs:read', 'runs:write'] });

    const listed = await admin.fetch('/api/v1/keys');
    const text = await listed.text();
    expect(text).not.toContain(secret);
    expect(text).not.toContain(row!.secret_hash);
    const mine = (JSON.parse(text) as ApiKeysResponse).keys.find((k) => k.id === key.id)!;
    expect(mine.prefix).toBe(secret.slice(0, 12));
    expect(mine.lastUsedAt).not.toBeNull();
    expect(Object.keys(mine).sort()).toEqual(['createdAt', 'id', 'lastUsedAt', 'name', 'owner', 'prefix', 'revokedAt', 'scopes']);
  });

  it('shows the first use at once, and later ones to the minute', async () => {
    const { secret, key } = (await (await admin.fetch('/api/v1/keys', json({ userId: researcher.me.user!.id, name: 'usage', scopes: ['atlas:read'] }))).json()) as ApiKeyCreatedResponse;
    const lastUsed = async () => ((await (await admin.fetch(`/api/v1/keys?userId=${researcher.me.user!.id}`)).json()) as ApiKeysResponse).keys.find((k) => k.id === key.id)!.lastUsedAt;
    expect(await lastUsed()).toBeNull();
    await (await meWith(`Bearer ${secret}`)).text();
    const first = await lastUsed();
    expect(first).not.toBeNull();
    await (await meWith(`Bearer ${secret}`)).text();
    expect(await lastUsed(), 'a use within the minute keeps the shown time').toBe(first);
    const source = await tdb.db.connect();
    await source.query(`UPDATE api_keys SET last_used_at = now() - make_interval(secs => $2) WHERE id = $1`, [key.id, KEY_USE_PRECISION_SECONDS + 5]);
    const setBack = await lastUsed();
    await (await meWith(`Bearer ${secret}`)).text();
    expect(Date.parse((await lastUsed())!), 'a use after the minute moves it').toBeGreaterThan(Date.parse(setBack!));
  });

  it('revokes at once; the next request with the key is 401; revoking again is fine', async () => {
    const { secret, key } = (await (await admin.fetch('/api/v1/keys', json({ userId: researcher.me.user!.id, name: 'short-lived', scopes: ['runs:read'] }))).json()) as ApiKeyCreatedResponse;
    expect((await meWith(`Bearer ${secret}`)).status).toBe(200);
    const revoked = await admin.fetch(`/api/v1/keys/${key.id}`, { method: 'DELETE' });
    expect(revoked.status).toBe(204);
    const next = await meWith(`Bearer ${secret}`);
    expect(next.status).toBe(401);
    expect((await errorOf(next)).code).toBe('invalid_key');
    expect((await admin.fetch(`/api/v1/keys/${key.id}`, { method: 'DELETE' })).status).toBe(204);
    const listed = ((await (await admin.fetch('/api/v1/keys')).json()) as ApiKeysResponse).keys.find((k) => k.id === key.id)!;
    expect(listed.revokedAt).not.toBeNull();
  });

  it('lists newest first and filters by member', async () => {
    await createApiKey(await tdb.db.connect(), { userId: viewer.me.user!.id, name: 'reader script', scopes: ['atlas:read'], createdBy: null });
    const all = ((await (await admin.fetch('/api/v1/keys')).json()) as ApiKeysResponse).keys;
    const times = all.map((k) => Date.parse(k.createdAt));
    expect(times).toEqual([...times].sort((a, b) => b - a));
    expect(all[0]!.name).toBe('reader script');
    const viewers = ((await (await admin.fetch(`/api/v1/keys?userId=${viewer.me.user!.id}`)).json()) as ApiKeysResponse).keys;
    expect(viewers.map((k: ApiKeyInfo) => k.name)).toEqual(['reader script']);
    const bad = await admin.fetch('/api/v1/keys?userId=not-a-uuid');
    expect(bad.status).toBe(400);
    expect((await errorOf(bad)).message).toMatch(/^query\.userId: /);
  });

  it('enforces the scopes of the key on real routes', async () => {
    const { secret } = (await (await admin.fetch('/api/v1/keys', json({ userId: researcher.me.user!.id, name: 'atlas only', scopes: ['atlas:read'] }))).json()) as ApiKeyCreatedResponse;
    // PATCH /me needs runs:read; this key has only atlas:read.
    const res = await fetch(`${app.url}/api/v1/me`, { method: 'PATCH', headers: { authorization: `Bearer ${secret}`, 'content-type': 'application/json' }, body: '{"notifyOnFinish":false}' });
    expect(res.status).toBe(403);
    expect((await errorOf(res)).message).toMatch(/lacks the scope runs:read/);
  });
});

describe('who may manage keys', () => {
  it('refuses viewers, researchers, anonymous callers and every API key, even an admin’s', async () => {
    const body = { userId: researcher.me.user!.id, name: 'x', scopes: ['runs:read'] };
    for (const who of [viewer, researcher]) {
      const res = await who.fetch('/api/v1/keys', json(body));
      expect(res.status).toBe(403);
      expect((await errorOf(res)).code).toBe('forbidden');
      expect((await who.fetch('/api/v1/keys')).status).toBe(403);
    }
    const anonymous = await fetch(`${app.url}/api/v1/keys`);
    expect(anonymous.status).toBe(401);
    await anonymous.text();

    const source = await tdb.db.connect();
    const adminKey = await createApiKey(source, { userId: admin.me.user!.id, name: 'admin script', scopes: ['runs:read', 'runs:write', 'atlas:read'], createdBy: admin.me.user!.id });
    for (const init of [{ method: 'GET' }, { method: 'POST', body: JSON.stringify(body) }, { method: 'DELETE' }]) {
      const path = init.method === 'DELETE' ? `/api/v1/keys/${adminKey.key.id}` : '/api/v1/keys';
      const res = await fetch(`${app.url}${path}`, { ...init, headers: { authorization: `Bearer ${adminKey.secret}`, 'content-type': 'application/json' } });
      expect(res.status, init.method).toBe(403);
      expect((await errorOf(res)).message).toMatch(/API keys cannot manage/);
    }
    const count = (await source.query(`SELECT count(*)::int AS n FROM api_keys WHERE revoked_at IS NOT NULL AND id = $1`, [adminKey.key.id])) as { n: number }[];
    expect(count[0]!.n).toBe(0);
  });

  it('refuses an unknown secret with 401', async () => {
    const res = await meWith('Bearer cairn_0000000000000000000000000000000000000000000');
    expect(res.status).toBe(401);
    expect((await errorOf(res)).code).toBe('invalid_key');
  });
});

describe('bad key requests', () => {
  const cases: [string, unknown, RegExp][] = [
    ['no scopes', { name: 'x', scopes: [] }, /^body\.scopes: give at least one scope/],
    ['a repeated scope', { name: 'x', scopes: ['runs:read', 'runs:read'] }, /^body\.scopes: each scope at most once/],
    ['an unknown scope', { name: 'x', scopes: ['admin'] }, /^body\.scopes\.0: /],
    ['an empty name', { name: '  ', scopes: ['runs:read'] }, /^body\.name: /],
    ['an unknown field', { name: 'x', scopes: ['runs:read'], secret: 'mine' }, /^body: /],
  ];
  for (const [what, partial, message] of cases) {
    it(`answers 400 naming the field for ${what}`, async () => {
      const res = await admin.fetch('/api/v1/keys', json({ userId: researcher.me.user!.id, ...(partial as object) }));
      expect(res.status).toBe(400);
      const error = await errorOf(res);
      expect(error.code).toBe('invalid_request');
      expect(error.message).toMatch(message);
    });
  }

  it('answers 400 for a malformed member id and 404 for an unknown one', async () => {
    const malformed = await admin.fetch('/api/v1/keys', json({ userId: 'tobias', name: 'x', scopes: ['runs:read'] }));
    expect(malformed.status).toBe(400);
    expect((await errorOf(malformed)).message).toMatch(/^body\.userId: /);
    const unknown = await admin.fetch('/api/v1/keys', json({ userId: '4b0c8a7e-1d2f-4c3b-9a8e-0f1e2d3c4b5a', name: 'x', scopes: ['runs:read'] }));
    expect(unknown.status).toBe(404);
    expect((await errorOf(unknown)).message).toMatch(/^body\.userId: no member/);
  });

  it('answers 400 for a malformed key id and 404 for an unknown one on revoke', async () => {
    const malformed = await admin.fetch('/api/v1/keys/42', { method: 'DELETE' });
    expect(malformed.status).toBe(400);
    expect((await errorOf(malformed)).message).toMatch(/^params\.id: /);
    const unknown = await admin.fetch('/api/v1/keys/4b0c8a7e-1d2f-4c3b-9a8e-0f1e2d3c4b5a', { method: 'DELETE' });
    expect(unknown.status).toBe(404);
    await unknown.text();
  });
});

describe('createApiKey, as the demo loader calls it', () => {
  it('stores the hash of the secret and its first 12 characters', async () => {
    const source = await tdb.db.connect();
    const owner = await insertMemberWithKey(source, 'loader-owner', 'researcher');
    const { key, secret } = await createApiKey(source, { userId: owner.userId, name: 'demo key', scopes: ['atlas:read'], createdBy: null });
    expect(secret.startsWith('cairn_')).toBe(true);
    const rows = (await source.query(`SELECT secret_hash, prefix FROM api_keys WHERE id = $1`, [key.id])) as { secret_hash: string; prefix: string }[];
    expect(rows[0]).toEqual({ secret_hash: createHash('sha256').update(secret).digest('hex'), prefix: secret.slice(0, 12) });
    expect((await meWith(`Bearer ${secret}`)).status).toBe(200);
  });
});
