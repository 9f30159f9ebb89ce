import { describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from '../src/index';

describe('loadConfig', () => {
  it('serves on loopback by default and builds the database URL from its parts', () => {
    const c = loadConfig({});
    expect(c.host).toBe('127.0.0.1');
    expect(c.port).toBe(4780);
    expect(c.databaseUrl).toBe('postgres://cairn@127.0.0.1:54780/cairn');
  });

  it('takes the ports and database name from the environment', () => {
    const c = loadConfig({ CAIRN_PORT: '5001', CAIRN_DB_PORT: '6001', CAIRN_DB_NAME: 'cairn_test', CAIRN_DEV_SERVICES: '0', CAIRN_SESSION_SECRET: 'a-long-enough-secret', CAIRN_GITHUB_CLIENT_ID: 'id', CAIRN_GITHUB_CLIENT_SECRET: 'secret' });
    expect(c.port).toBe(5001);
    expect(c.databaseUrl).toBe('postgres://cairn@127.0.0.1:6001/cairn_test');
    expect(c.devServices).toBe(false);
  });

  it('refuses to run without the local stand-ins unless real sign-in and a session secret are set', () => {
    expect(() => loadConfig({ CAIRN_DEV_SERVICES: '0' })).toThrow(/CAIRN_SESSION_SECRET/);
    expect(() => loadConfig({ CAIRN_DEV_SERVICES: '0', CAIRN_SESSION_SECRET: 'a-long-enough-secret' })).toThrow(/CAIRN_GITHUB_CLIENT_ID/);
    expect(() => loadConfig({ CAIRN_GITHUB_CLIENT_ID: 'only-the-id' })).toThrow(/go together/);
  });

  it('names each wrong variable', () => {
    expect(() => loadConfig({ CAIRN_PORT: 'eighty', CAIRN_DB_NAME: 'Robert; DROP' })).toThrow(ConfigError);
    try {
      loadConfig({ CAIRN_PORT: '70000' });
    } catch (err) {
      expect((err as Error).message).toMatch(/CAIRN_PORT/);
    }
    expect.assertions(2);
  });
});
