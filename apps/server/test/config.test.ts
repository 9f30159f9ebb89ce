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
    const c = loadConfig({ CAIRN_PORT: '5001', CAIRN_DB_PORT: '6001', CAIRN_DB_NAME: 'cairn_test', CAIRN_DEV_SERVICES: '0' });
    expect(c.port).toBe(5001);
    expect(c.databaseUrl).toBe('postgres://cairn@127.0.0.1:6001/cairn_test');
    expect(c.devServices).toBe(false);
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
