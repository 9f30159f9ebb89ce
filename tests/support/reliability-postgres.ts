import { execFile } from 'node:child_process';
import { chownSync, existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import pg from 'pg';
import { freePort } from './free-port';

const run = promisify(execFile);

/** Debian's PostgreSQL server programs, the newest version installed. */
function pgBin(): string {
  const root = '/usr/lib/postgresql';
  const versions = existsSync(root) ? readdirSync(root).filter((v) => existsSync(join(root, v, 'bin/pg_ctl'))) : [];
  versions.sort((a, b) => Number(b) - Number(a));
  if (!versions[0]) throw new Error('no PostgreSQL server programs under /usr/lib/postgresql');
  return join(root, versions[0], 'bin');
}

export interface PrivateCluster {
  port: number;
  dir: string;
  url: (db: string) => string;
  /** pg_ctl stop -m fast. */
  stop: () => Promise<void>;
  /** pg_ctl start (waits until it accepts connections). */
  start: () => Promise<void>;
  /** Stops the cluster if it runs and deletes its directory; safe to call twice. */
  destroy: () => Promise<void>;
}

/**
 * A PostgreSQL cluster of its own for a test (never the shared one): initdb into a temporary directory
 * owned by postgres (PostgreSQL refuses root), listening on a free loopback port with its socket in that
 * directory, user cairn with trust authentication.
 */
export async function startPrivateCluster(): Promise<PrivateCluster> {
  const bin = pgBin();
  const asRoot = process.getuid?.() === 0;
  const dir = mkdtempSync(join(tmpdir(), 'cairn-faults-pg-'));
  const data = join(dir, 'data');
  const log = join(dir, 'postgres.log');
  if (asRoot) {
    const uid = Number((await run('id', ['-u', 'postgres'])).stdout.trim());
    const gid = Number((await run('id', ['-g', 'postgres'])).stdout.trim());
    chownSync(dir, uid, gid);
  }
  const asPg = (file: string, args: string[]) => (asRoot ? run('runuser', ['-u', 'postgres', '--', join(bin, file), ...args]) : run(join(bin, file), args));
  const port = await freePort();
  await asPg('initdb', ['-D', data, '-N', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8', '-U', 'cairn']);
  let running = false;
  const start = async () => {
    await asPg('pg_ctl', ['-D', data, '-l', log, '-w', '-t', '30', '-o', `-c listen_addresses=127.0.0.1 -p ${port} -k ${dir}`, 'start']);
    running = true;
  };
  const stop = async () => {
    await asPg('pg_ctl', ['-D', data, '-w', '-t', '30', '-m', 'fast', 'stop']);
    running = false;
  };
  const destroy = async () => {
    if (running || existsSync(join(data, 'postmaster.pid'))) await stop().catch(() => {});
    rmSync(dir, { recursive: true, force: true });
  };
  try {
    await start();
  } catch (err) {
    await destroy();
    throw err;
  }
  return { port, dir, url: (db) => `postgres://cairn@127.0.0.1:${port}/${db}`, start, stop, destroy };
}

/** CREATE DATABASE on a private cluster. */
export async function createDatabase(cluster: PrivateCluster, name: string): Promise<void> {
  const client = new pg.Client({ connectionString: cluster.url('postgres') });
  await client.connect();
  try {
    await client.query(`CREATE DATABASE ${name}`);
  } finally {
    await client.end();
  }
}
