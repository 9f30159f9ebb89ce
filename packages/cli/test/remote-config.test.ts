import { mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { readRemoteConfig, remoteConfigPath, resolveRemote, writeRemoteConfig } from '../src/remote/remote-config';

let dir: string | undefined;
afterEach(() => dir && rmSync(dir, { recursive: true, force: true }));
const fresh = () => (dir = mkdtempSync(join(tmpdir(), 'cairn-remote-')));

describe('the saved remote login', () => {
  it('lives in the XDG config directory and is readable by its owner only', () => {
    const env = { XDG_CONFIG_HOME: fresh() };
    const path = remoteConfigPath(env);
    expect(path).toBe(join(dir!, 'cairn', 'remote.json'));
    writeRemoteConfig({ server: 'http://127.0.0.1:4780', key: 'cairn_abcdefghijkl' }, path);
    expect(statSync(path).mode & 0o777).toBe(0o600);
    expect(readRemoteConfig(path)).toEqual({ server: 'http://127.0.0.1:4780', key: 'cairn_abcdefghijkl' });
  });

  it('takes flags over the environment over the file', () => {
    const env: NodeJS.ProcessEnv = { XDG_CONFIG_HOME: fresh() };
    writeRemoteConfig({ server: 'http://127.0.0.1:1111', key: 'cairn_from_file' }, remoteConfigPath(env));
    expect(resolveRemote({}, env)).toEqual({ server: 'http://127.0.0.1:1111', key: 'cairn_from_file' });
    env.CAIRN_API_KEY = 'cairn_from_env';
    expect(resolveRemote({}, env).key).toBe('cairn_from_env');
    expect(resolveRemote({ key: 'cairn_from_flag', server: 'http://127.0.0.1:2222/' }, env)).toEqual({ server: 'http://127.0.0.1:2222', key: 'cairn_from_flag' });
  });

  it('says what is missing or wrong', () => {
    const env = { XDG_CONFIG_HOME: fresh() };
    expect(() => resolveRemote({}, env)).toThrow(/no server/);
    expect(() => resolveRemote({ server: 'http://127.0.0.1:1' }, env)).toThrow(/no API key/);
    expect(() => resolveRemote({ server: '127.0.0.1:1', key: 'cairn_x' }, env)).toThrow(/http\(s\) URL/);
    expect(() => resolveRemote({ server: 'http://127.0.0.1:1', key: 'secret' }, env)).toThrow(/begins with 'cairn_'/);
  });

  it('refuses a damaged file with a way out', () => {
    const env = { XDG_CONFIG_HOME: fresh() };
    const path = remoteConfigPath(env);
    writeRemoteConfig({ server: 'http://127.0.0.1:4780', key: 'cairn_k' }, path);
    writeFileSync(path, '{ not json');
    expect(() => readRemoteConfig(path)).toThrow(/not valid JSON; run cairn remote login again/);
  });
});
