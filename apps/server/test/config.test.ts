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

  it('sets the per-member limits by role, from the environment within the server\'s hard caps', () => {
    expect(loadConfig({}).memberLimits).toEqual({
      researcher: { activeRuns: 20, activeSweeps: 5, runVertices: 250_000, runEdges: 1_000_000 },
      admin: { activeRuns: 100, activeSweeps: 20, runVertices: 1_000_000, runEdges: 4_000_000 },
    });
    const c = loadConfig({ CAIRN_MAX_ACTIVE_RUNS_RESEARCHER: '5000', CAIRN_MAX_ACTIVE_SWEEPS_ADMIN: '2', CAIRN_MAX_RUN_VERTICES_RESEARCHER: '1000000' });
    expect(c.memberLimits.researcher).toMatchObject({ activeRuns: 5000, runVertices: 1_000_000 });
    expect(c.memberLimits.admin.activeSweeps).toBe(2);
    expect(() => loadConfig({ CAIRN_MAX_RUN_VERTICES_ADMIN: '1000001' })).toThrow(/CAIRN_MAX_RUN_VERTICES_ADMIN/);
    expect(() => loadConfig({ CAIRN_MAX_RUN_EDGES_RESEARCHER: '4000001' })).toThrow(/CAIRN_MAX_RUN_EDGES_RESEARCHER/);
    expect(() => loadConfig({ CAIRN_MAX_ACTIVE_RUNS_RESEARCHER: '0' })).toThrow(/CAIRN_MAX_ACTIVE_RUNS_RESEARCHER/);
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
