import { spawn, type ChildProcess } from 'node:child_process';
import { createHash, randomBytes } from 'node:crypto';
import { join } from 'node:path';
import pg from 'pg';
import type { RunView } from '@cairn/schema';
import { databaseUrl, repoRoot, serverEnv } from '../support/test-env';

/** The run queue turned down for tests: quick polling, maintenance each second, short expiry and staleness. */
export const FAST_QUEUE_ENV: Record<string, string> = {
  CAIRN_QUEUE_POLL_SECONDS: '0.5',
  CAIRN_QUEUE_MAINTENANCE_SECONDS: '1',
  CAIRN_QUEUE_EXPIRY_MARGIN_SECONDS: '5',
  CAIRN_QUEUE_STALE_SECONDS: '2',
  CAIRN_QUEUE_RECOVERY_SECONDS: '2',
};

export const builtWorkerEntry = join(repoRoot, 'apps/server/dist/worker.js');

/** A member and an API key written straight into the test database (SHA-256 of the secret, first 12 characters shown). */
export async function insertMemberWithKey(login: string, role: 'admin' | 'researcher' | 'viewer'): Promise<string> {
  const client = new pg.Client({ connectionString: databaseUrl() });
  await client.connect();
  try {
    const githubId = 8_000_000 + randomBytes(3).readUIntBE(0, 3);
    const { rows } = await client.query<{ id: string }>(`INSERT INTO users (github_id, login, email, role) VALUES ($1, $2, $3, $4) RETURNING id`, [githubId, login, `${login}@members.example`, role]);
    const secret = `cairn_${randomBytes(24).toString('base64url')}`;
    await client.query(`INSERT INTO api_keys (user_id, name, prefix, secret_hash, scopes) VALUES ($1, 'test key', $2, $3, $4)`, [
      rows[0]!.id,
      secret.slice(0, 12),
      createHash('sha256').update(secret).digest('hex'),
      ['runs:read', 'runs:write', 'atlas:read'],
    ]);
    return `Bearer ${secret}`;
  } finally {
    await client.end();
  }
}

/** A query on the test database. */
export async function sql<T>(text: string, values: unknown[] = []): Promise<T[]> {
  const client = new pg.Client({ connectionString: databaseUrl() });
  await client.connect();
  try {
    return (await client.query(text, values)).rows as T[];
  } finally {
    await client.end();
  }
}

export interface WorkerProcess {
  child: ChildProcess;
  /** What the runs' worker column says for it: `${hostname}:${pid}`. */
  name: string;
  output: () => string;
  /** SIGTERM, then the exit code. */
  stop: () => Promise<number | null>;
  exited: Promise<number | null>;
}

/** Runs the built worker entry (`node apps/server/dist/worker.js`) on the test database and waits until it takes jobs. */
export async function startWorkerProcess(extraEnv: Record<string, string> = {}): Promise<WorkerProcess> {
  const env = { ...process.env, ...serverEnv({ CAIRN_RUN_CONCURRENCY: '1', CAIRN_ENGINE_THREADS: '1', ...FAST_QUEUE_ENV, ...extraEnv }) };
  const child = spawn(process.execPath, [builtWorkerEntry], { env, stdio: ['ignore', 'pipe', 'pipe'] });
  let out = '';
  child.stdout!.on('data', (b: Buffer) => (out += b.toString()));
  child.stderr!.on('data', (b: Buffer) => (out += b.toString()));
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  const name = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`worker did not start within 20 s:\n${out}`)), 20_000);
    child.stdout!.on('data', () => {
      const m = /Cairn run workers are taking jobs \(\d+ at once, worker (\S+)\)/.exec(out);
      if (m) {
        clearTimeout(timer);
        resolve(m[1]!);
      }
    });
    void exited.then((code) => {
      clearTimeout(timer);
      reject(new Error(`worker exited with ${code} before taking jobs:\n${out}`));
    });
  });
  return {
    child,
    name,
    output: () => out,
    exited,
    stop: async () => {
      if (child.exitCode === null && child.signalCode === null) child.kill('SIGTERM');
      return exited;
    },
  };
}

/** A JSON request to a server with a Bearer key. */
export async function api<T>(base: string, method: string, path: string, authorization: string, body?: unknown): Promise<{ status: number; body: T }> {
  const res = await fetch(`${base}${path}`, {
    method,
    headers: { authorization, ...(body !== undefined ? { 'content-type': 'application/json' } : {}) },
    ...(body !== undefined ? { body: JSON.stringify(body) } : {}),
  });
  return { status: res.status, body: (await res.json()) as T };
}

/** Polls a run until `until` holds (its status is final by default). */
export async function waitForRun(base: string, id: string, authorization: string, until: (r: RunView) => boolean = (r) => ['done', 'failed', 'cancelled'].includes(r.status), timeoutMs = 60_000): Promise<RunView> {
  const deadline = Date.now() + timeoutMs;
  let last: RunView | undefined;
  while (Date.now() < deadline) {
    last = (await api<RunView>(base, 'GET', `/api/v1/runs/${id}`, authorization)).body;
    if (until(last)) return last;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`run ${id} did not get there in ${timeoutMs} ms; last ${JSON.stringify(last && { status: last.status, error: last.error, attempts: last.attempts })}`);
}
