import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../src/index';
import { serveApp, type ServedApp } from './support/listen';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { testContext } from './support/test-context';
import { insertMemberWithKey } from './support/test-key';

// Rate limits with CAIRN_RATE_LIMIT_PER_MINUTE=5, against the real database (keys are looked up there).
const LIMIT = 5;

let tdb: TestDatabase;
let served: ServedApp;
let base: string;
let first: string;
let second: string;

beforeAll(async () => {
  tdb = await createTestDatabase('security_rate_limits');
  const source = await tdb.db.connect();
  first = (await insertMemberWithKey(source, 'first-limited', 'researcher')).authorization;
  second = (await insertMemberWithKey(source, 'second-limited', 'researcher')).authorization;
  served = await serveApp(createApp(testContext(tdb.db, {}, { CAIRN_RATE_LIMIT_PER_MINUTE: String(LIMIT) })));
  base = served.url;
});

afterAll(async () => {
  await served?.close();
  await tdb?.drop();
});

const listGraphs = (authorization?: string) => fetch(`${base}/api/v1/graphs`, authorization ? { headers: { authorization } } : {});

describe('rate limits', () => {
  it('refuses the sixth request of a key in a minute with a JSON 429, and still serves another key', async () => {
    for (let i = 1; i <= LIMIT; i++) {
      const res = await listGraphs(first);
      expect(res.status, `request ${i}`).toBe(200);
      // The IETF draft header: the policy's name, then the requests remaining and the seconds to the reset.
      expect(res.headers.get('ratelimit')).toMatch(new RegExp(`^"cairn-api"; r=${LIMIT - i}; t=\\d+$`));
      expect(res.headers.get('ratelimit-policy')).toMatch(new RegExp(`^"cairn-api"; q=${LIMIT}; w=60; pk=:`));
      await res.arrayBuffer();
    }
    const refused = await listGraphs(first);
    expect(refused.status).toBe(429);
    const body = (await refused.json()) as { error: { code: string; message: string; details: { retryAfterSeconds: number } } };
    expect(body.error.code).toBe('rate_limited');
    expect(body.error.message).toContain(`${LIMIT} a minute`);
    expect(Number.isInteger(body.error.details.retryAfterSeconds)).toBe(true);
    expect(body.error.details.retryAfterSeconds).toBeGreaterThan(0);
    expect(body.error.details.retryAfterSeconds).toBeLessThanOrEqual(60);
    expect(refused.headers.get('retry-after')).toBe(String(body.error.details.retryAfterSeconds));

    const other = await listGraphs(second);
    expect(other.status).toBe(200);
    expect(other.headers.get('ratelimit')).toMatch(new RegExp(`; r=${LIMIT - 1}; `));
  });

  it('counts requests without a key by address, apart from the keys sent from it', async () => {
    // The first key is used up, yet the same address without a key has its own count.
    for (let i = 1; i <= LIMIT; i++) {
      const res = await listGraphs();
      expect(res.status, `request ${i}`).toBe(401);
      await res.arrayBuffer();
    }
    const refused = await listGraphs();
    expect(refused.status).toBe(429);
    expect(((await refused.json()) as { error: { code: string } }).error.code).toBe('rate_limited');
  });

  it('never limits the health check', async () => {
    for (let i = 0; i < 3 * LIMIT; i++) {
      const res = await fetch(`${base}/api/health`);
      expect(res.status).toBe(200);
      expect(res.headers.get('ratelimit')).toBeNull();
      await res.arrayBuffer();
    }
  });
});
