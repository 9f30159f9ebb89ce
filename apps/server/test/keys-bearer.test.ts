import express from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { actorOf, requirePermission } from '../src/auth/require';
import { installAuth } from '../src/auth/install-auth';
import { errorHandler } from '../src/http/errors';
import { KEY_USE_PRECISION_SECONDS } from '../src/services/api-keys';
import { createLogger } from '../src/logger';
import { serveApp, type ServedApp } from './support/listen';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { testContext } from './support/test-context';
import { insertMemberWithKey } from './support/test-key';

// An app with only the authentication layer and two probe routes, so the key handling is tested apart
// from every other router: one route says who the caller is, one needs runs:write.
let tdb: TestDatabase;
let served: ServedApp;
let base: string;

beforeAll(async () => {
  tdb = await createTestDatabase('keys_bearer');
  const app = express();
  app.use(express.json());
  installAuth(app, testContext(tdb.db));
  app.get('/api/probe/who', (req, res) => {
    const actor = actorOf(req);
    res.json(actor.kind === 'anonymous' ? { kind: 'anonymous' } : { kind: actor.kind, login: actor.user.login, keyId: actor.kind === 'key' ? actor.key.id : null });
  });
  app.post('/api/probe/write', requirePermission('runs:write'), (_req, res) => {
    res.status(201).json({ ok: true });
  });
  app.use(errorHandler(createLogger('silent')));
  served = await serveApp(app);
  base = served.url;
});

afterAll(async () => {
  await served.close();
  await tdb.drop();
});

const who = (headers: Record<string, string> = {}) => fetch(`${base}/api/probe/who`, { headers });

describe('API key authentication', () => {
  it('treats a request without Authorization header as anonymous', async () => {
    const res = await who();
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ kind: 'anonymous' });
  });

  it('identifies the owner of a good key, records its first use at once and later uses at most once a minute', async () => {
    const source = await tdb.db.connect();
    const member = await insertMemberWithKey(source, 'bearer-owner', 'researcher');
    const lastUsed = async () => ((await source.query(`SELECT last_used_at FROM api_keys WHERE user_id = $1`, [member.userId])) as { last_used_at: Date | null }[])[0]!.last_used_at;
    expect(await lastUsed()).toBeNull();
    const res = await who({ authorization: member.authorization });
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ kind: 'key', login: 'bearer-owner' });
    const first = await lastUsed();
    expect(first).toBeInstanceOf(Date);
    // A use within KEY_USE_PRECISION_SECONDS of the last one writes nothing (no row lock per request).
    await new Promise((r) => setTimeout(r, 20));
    expect((await who({ authorization: member.authorization })).status).toBe(200);
    expect((await lastUsed())!.getTime()).toBe(first!.getTime());
    // Once the stored use is older than that, the next use moves it to now.
    const longAgo = new Date(first!.getTime() - (KEY_USE_PRECISION_SECONDS + 5) * 1000);
    await source.query(`UPDATE api_keys SET last_used_at = $2 WHERE user_id = $1`, [member.userId, longAgo]);
    expect((await who({ authorization: member.authorization })).status).toBe(200);
    expect((await lastUsed())!.getTime()).toBeGreaterThanOrEqual(first!.getTime());
  });

  it('refuses unknown secrets and malformed headers with 401 invalid_key', async () => {
    for (const authorization of ['Bearer cairn_not-a-key-of-anyone', 'Basic dXNlcjpwYXNz', 'Bearer', 'cairn_abc', 'Bearer a b']) {
      const res = await who({ authorization });
      expect(res.status, authorization).toBe(401);
      const body = (await res.json()) as { error: { code: string; message: string } };
      expect(body.error.code).toBe('invalid_key');
      expect(res.headers.get('www-authenticate')).toMatch(/^Bearer/);
    }
  });

  it('refuses a revoked key from the very next request', async () => {
    const source = await tdb.db.connect();
    const member = await insertMemberWithKey(source, 'soon-revoked', 'researcher');
    expect((await who({ authorization: member.authorization })).status).toBe(200);
    await source.query(`UPDATE api_keys SET revoked_at = now() WHERE user_id = $1`, [member.userId]);
    const res = await who({ authorization: member.authorization });
    expect(res.status).toBe(401);
    expect(((await res.json()) as { error: { code: string } }).error.code).toBe('invalid_key');
  });

  it("narrows the owner's role to the key's scopes", async () => {
    const source = await tdb.db.connect();
    const readOnly = await insertMemberWithKey(source, 'read-only-key', 'researcher', ['runs:read', 'atlas:read']);
    const writer = await insertMemberWithKey(source, 'writer-key', 'researcher', ['runs:write']);
    const viewer = await insertMemberWithKey(source, 'viewer-key', 'viewer', ['runs:write']);
    const write = (authorization?: string) =>
      fetch(`${base}/api/probe/write`, { method: 'POST', headers: authorization ? { authorization } : {} });
    const denied = await write(readOnly.authorization);
    expect(denied.status).toBe(403);
    expect(((await denied.json()) as { error: { message: string } }).error.message).toMatch(/lacks the scope runs:write/);
    expect((await write(writer.authorization)).status).toBe(201);
    // A scope never lifts a key above its owner's role.
    expect((await write(viewer.authorization)).status).toBe(403);
    expect((await write()).status).toBe(401);
  });
});
