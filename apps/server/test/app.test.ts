import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp, createLogger } from '../src/index';
import { serveApp, type ServedApp } from './support/listen';
import { testContext } from './support/test-context';
import { unreachableDatabase } from './support/test-database';

let served: ServedApp;
let base: string;
const logger = createLogger('silent');
const db = unreachableDatabase(logger);

beforeAll(async () => {
  served = await serveApp(createApp(testContext(db, { logger })));
  base = served.url;
});
afterAll(() => served?.close());

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
