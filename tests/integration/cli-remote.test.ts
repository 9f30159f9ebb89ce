import { execFile } from 'node:child_process';
import { mkdtempSync, readFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { graphFromSpec, verifyRanking } from '@cairn/engine';
import { RunView } from '@cairn/schema';
import { createDataSource, createLogger, Database, loadDemoData } from '@cairn/server';
import { startBuiltServer, type BuiltServer } from '../support/built-server';
import { databaseUrl, repoRoot } from '../support/test-env';

const bin = join(repoRoot, 'packages/cli/bin/cairn.js');
const config = mkdtempSync(join(tmpdir(), 'cairn-remote-config-'));
let server: BuiltServer;
let key: string;

/** Runs the built command with its own config directory and no key in the environment. */
function cairn(args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  const env: NodeJS.ProcessEnv = { ...process.env, XDG_CONFIG_HOME: config };
  delete env.CAIRN_API_KEY;
  delete env.CAIRN_SERVER;
  return new Promise((resolve) => {
    execFile(process.execPath, [bin, ...args], { env, timeout: 90_000 }, (err, stdout, stderr) => {
      resolve({ code: err ? (typeof err.code === 'number' ? err.code : 1) : 0, stdout, stderr });
    });
  });
}

beforeAll(async () => {
  const db = new Database(createDataSource(databaseUrl()), createLogger('silent'));
  key = (await loadDemoData(await db.connect())).apiKey;
  await db.close();
  server = await startBuiltServer({ CAIRN_RUN_CONCURRENCY: '1' });
}, 60_000);
afterAll(async () => {
  await server?.stop();
});

describe('cairn remote against the built server', () => {
  it('login checks the key and saves it readable by its owner only', async () => {
    const { code, stdout } = await cairn(['remote', 'login', '--server', server.url, '--key', key]);
    expect(code).toBe(0);
    expect(stdout).toMatch(/signed in to .* as tobias-quell \(researcher/);
    const file = join(config, 'cairn', 'remote.json');
    expect(statSync(file).mode & 0o777).toBe(0o600);
    expect(JSON.parse(readFileSync(file, 'utf8'))).toEqual({ server: server.url, key });
  });

  it('submit --wait returns the path P_15 with rank number floor(log2 15) + 1 = 4 (Bodlaender et al., "Rankings of graphs", 1998)', async () => {
    const { code, stdout } = await cairn(['remote', 'submit', 'path:15', '--wait', '--json', '--quiet']);
    expect(code).toBe(0);
    const run = RunView.parse(JSON.parse(stdout));
    expect(run.status).toBe('done');
    expect(run.rankNumber).toBe(4);
    expect(verifyRanking(graphFromSpec('path:15'), run.result!.labels)).toMatchObject({ valid: true, maxLabel: 4 });

    const status = await cairn(['remote', 'status', run.id]);
    expect(status.code).toBe(0);
    expect(status.stdout).toContain(`${run.id}  path:15  done  rank number 4`);

    const pulled = await cairn(['remote', 'pull', run.id, '--format', 'csv']);
    expect(pulled.code).toBe(0);
    const lines = pulled.stdout.trim().split('\n');
    expect(lines).toHaveLength(16);
    const labels = lines.slice(1).map((l) => Number(l.split(',')[1]));
    expect(verifyRanking(graphFromSpec('path:15'), labels).valid).toBe(true);

    const atlas = await cairn(['remote', 'atlas', '--family', 'path']);
    expect(atlas.code).toBe(0);
    expect(atlas.stdout).toContain('path:15\t4\texact');
  });

  it('says what went wrong: a refused key, an unreachable server, a bad spec', async () => {
    const refused = await cairn(['remote', 'status', '00000000-0000-4000-8000-000000000000', '--server', server.url, '--key', 'cairn_not_a_real_key_at_all']);
    expect(refused.code).toBe(2);
    expect(refused.stderr).toMatch(/refused GET .*check the API key/);
    const away = await cairn(['remote', 'atlas', '--server', 'http://127.0.0.1:9', '--key', key]);
    expect(away.code).toBe(2);
    expect(away.stderr).toMatch(/cannot reach http:\/\/127\.0\.0\.1:9/);
    const bad = await cairn(['remote', 'submit', 'grid:4by9']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/body\.spec/);
  });
});
