import { execFile } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { builtServerEntry } from '../support/built-server';
import { repoRoot, serverEnv, withoutStandIns } from '../support/test-env';

const run = promisify(execFile);

describe('built entry points', () => {
  it('runs the cairn command through its bin shim', async () => {
    const pkg = JSON.parse(readFileSync(join(repoRoot, 'packages/cli/package.json'), 'utf8')) as { version: string };
    const { stdout } = await run(process.execPath, [join(repoRoot, 'packages/cli/bin/cairn.js'), '--version']);
    expect(stdout.trim()).toBe(pkg.version);
  });

  it('refuses a taken port with one line that names it and the variable to change', async () => {
    const holder = createServer();
    await new Promise<void>((r) => holder.listen(0, '127.0.0.1', r));
    const port = (holder.address() as { port: number }).port;
    try {
      const err = await run(process.execPath, [builtServerEntry], {
        env: { ...process.env, ...serverEnv({ CAIRN_PORT: String(port), CAIRN_DEV_SERVICES: '0', ...withoutStandIns }) },
      }).then(
        () => undefined,
        (e: { code: number; stderr: string }) => e,
      );
      expect(err?.code).toBe(1);
      expect(err?.stderr.trim()).toBe(`cairn: port ${port} on 127.0.0.1 is taken; set CAIRN_PORT to choose another`);
    } finally {
      holder.close();
    }
  });
});
