import { chmodSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { homedir } from 'node:os';
import { dirname, join } from 'node:path';
import { z } from 'zod';
import { CliError } from '../cli-error';

/** Where `cairn remote login` keeps the server and key: the user's config directory, readable by them only. */
export function remoteConfigPath(env: NodeJS.ProcessEnv = process.env): string {
  const base = env.XDG_CONFIG_HOME && env.XDG_CONFIG_HOME.length > 0 ? env.XDG_CONFIG_HOME : join(homedir(), '.config');
  return join(base, 'cairn', 'remote.json');
}

const RemoteConfig = z.object({ server: z.string().url(), key: z.string().startsWith('cairn_') });
export type RemoteConfig = z.infer<typeof RemoteConfig>;

export function readRemoteConfig(path = remoteConfigPath()): RemoteConfig | undefined {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch {
    return undefined;
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw new CliError(`${path} is not valid JSON; run cairn remote login again`);
  }
  const parsed = RemoteConfig.safeParse(json);
  if (!parsed.success) throw new CliError(`${path} does not hold a server and a cairn_ key; run cairn remote login again`);
  return parsed.data;
}

/** Writes the file with mode 600 (and its folder 700): the key is a secret. */
export function writeRemoteConfig(config: RemoteConfig, path = remoteConfigPath()): void {
  mkdirSync(dirname(path), { recursive: true, mode: 0o700 });
  writeFileSync(path, `${JSON.stringify(config, null, 2)}\n`, { mode: 0o600 });
  chmodSync(path, 0o600);
}

export interface RemoteFlags {
  server?: string;
  key?: string;
}

/** The server and key to use: flags first, then CAIRN_SERVER / CAIRN_API_KEY, then the config file. */
export function resolveRemote(flags: RemoteFlags, env: NodeJS.ProcessEnv = process.env): RemoteConfig {
  const saved = readRemoteConfig(remoteConfigPath(env));
  const server = flags.server ?? env.CAIRN_SERVER ?? saved?.server;
  const key = flags.key ?? env.CAIRN_API_KEY ?? saved?.key;
  if (!server) throw new CliError('no server: pass --server <url>, set CAIRN_SERVER, or run cairn remote login');
  if (!key) throw new CliError('no API key: pass --key <cairn_...>, set CAIRN_API_KEY, or run cairn remote login');
  if (!/^https?:\/\//.test(server)) throw new CliError(`--server must be an http(s) URL, got '${server}'`);
  if (!key.startsWith('cairn_')) throw new CliError("an API key begins with 'cairn_'");
  return { server: server.replace(/\/+$/, ''), key };
}
