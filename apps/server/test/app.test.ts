import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp, createDataSource, createLogger, Database } from '../src/index';
import { testContext } from './support/test-context';

// A database URL on a port where nothing listens (port 9, discard, is closed on loopback here).
const unreachable = 'postgres://cairn@127.0.0.1:9/cairn_unit';
let server: Server;
let base: string;
const logger = createLogger('silent');
const db = new Database(createDataSource(unreachable), logger);

beforeAll(async () => {
  server = createServer(createApp(testContext(db, { logger })));
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(() => new Promise<void>((r) => server.close(() => r())));

describe('API without a database', () => {
  it('answers health with 503 and the reason', async () => {
    const res = await fetch(`${base}/api/health`);
    expect(res.status).toBe(503);
    const body = (await res.json()) as Record<string, string>;
    expect(body).toMatchObject({ status: 'degraded', db: 'down' });
    expect(body.reason).toMatch(/^database unreachable: /);
  });

  it('answers an unknown API path with a JSON 404', async () => {
    const res = await fetch(`${base}/api/no-such-thing`);
    expect(res.status).toBe(404);
    expect(await res.json()).toEqual({ error: { code: 'not_found', message: 'no API route GET /api/no-such-thing' } });
  });

  it('answers malformed JSON with a JSON 400, not a stack trace', async () => {
    const res = await fetch(`${base}/api/health`, { method: 'POST', body: '{"a":', headers: { 'content-type': 'application/json' } });
    expect(res.status).toBe(400);
    const body = (await res.json()) as { error: { code: string } };
    expect(body.error.code).toBe('bad_json');
  });
});
