import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { freePort } from './free-port';
import { repoRoot, serverEnv } from './test-env';

export interface BuiltServer {
  url: string;
  child: ChildProcess;
  output: () => string;
  stop: () => Promise<number | null>;
}

export const builtServerEntry = join(repoRoot, 'apps/server/dist/main.js');

/** Extra Node.js flags for the server under test (e.g. --cpu-prof when profiling a suite), space-separated. */
const nodeArgs = () => (process.env.CAIRN_SERVER_NODE_ARGS ?? '').split(' ').filter(Boolean);

/** Runs the built server (`node apps/server/dist/main.js`) as its own process on free loopback ports. */
export async function startBuiltServer(extraEnv: Record<string, string> = {}): Promise<BuiltServer> {
  const [port, devPort, smtpPort] = [await freePort(), await freePort(), await freePort()];
  const env = { ...process.env, ...serverEnv({ CAIRN_PORT: String(port), CAIRN_DEV_PORT: String(devPort), CAIRN_SMTP_PORT: String(smtpPort), ...extraEnv }) };
  const child = spawn(process.execPath, [...nodeArgs(), builtServerEntry], { env, stdio: ['ignore', 'pipe', 'pipe'] });
  let out = '';
  child.stdout!.on('data', (b: Buffer) => (out += b.toString()));
  child.stderr!.on('data', (b: Buffer) => (out += b.toString()));
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start within 20 s:\n${out}`)), 20_000);
    const onData = () => {
      const m = /Cairn is serving at (\S+)/.exec(out);
      if (m) {
        clearTimeout(timer);
        resolve(m[1]!);
      }
    };
    child.stdout!.on('data', onData);
    exited.then((code) => {
      clearTimeout(timer);
      reject(new Error(`server exited with ${code} before serving:\n${out}`));
    });
  });
  return {
    url,
    child,
    output: () => out,
    stop: async () => {
      if (child.exitCode === null) child.kill('SIGTERM');
      return exited;
    },
  };
}
