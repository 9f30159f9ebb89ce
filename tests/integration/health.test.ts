import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HealthResponse } from '@cairn/schema';
import { createLogger, loadConfig, startServer, type RunningServer } from '@cairn/server';
import { serverEnv, withoutStandIns } from '../support/test-env';

const logger = createLogger('silent');
let server: RunningServer;

beforeAll(async () => {
  server = await startServer(loadConfig(serverEnv({ CAIRN_PORT: '0', CAIRN_DEV_SERVICES: '0', ...withoutStandIns })), logger);
});
afterAll(() => server.close());

describe('GET /api/health on the real PostgreSQL', () => {
  it('answers ok after a real query', async () => {
    const res = await fetch(`${server.url}/api/health`);
    expect(res.status).toBe(200);
    const body = HealthResponse.parse(await res.json());
    expect(body).toMatchObject({ status: 'ok', db: 'ok' });
  });

  it('answers 503 with the reason PostgreSQL gives for a database that does not exist', async () => {
    const other = await startServer(loadConfig(serverEnv({ CAIRN_PORT: '0', CAIRN_DEV_SERVICES: '0', ...withoutStandIns, CAIRN_DB_NAME: 'cairn_missing_test' })), logger);
    try {
      const res = await fetch(`${other.url}/api/health`);
      expect(res.status).toBe(503);
      const body = HealthResponse.parse(await res.json());
      expect(body.db).toBe('down');
      expect(body.reason).toMatch(/cairn_missing_test.*does not exist/);
    } finally {
      await other.close();
    }
  });
});
