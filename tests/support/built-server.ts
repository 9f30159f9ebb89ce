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

export interface BuiltServerOptions {
  /** Set CAIRN_PUBLIC_URL to the server's own loopback address (sign-in and share links come back to it). */
  publicUrlIsOwn?: boolean;
}

const ATTEMPTS = 4;

/**
 * Runs the built server (`node apps/server/dist/main.js`) as its own process on free loopback ports. A port
 * that another process takes between the choice and the bind is chosen again (up to four times), unless
 * the caller fixed it in extraEnv.
 */
export async function startBuiltServer(extraEnv: Record<string, string> = {}, options: BuiltServerOptions = {}): Promise<BuiltServer> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await startOnce(extraEnv, options);
    } catch (err) {
      if (!(err instanceof PortTakenByOther) || attempt === ATTEMPTS) throw err;
    }
  }
}

/** The server refused to start because a port it was given (and the caller did not fix) is taken. */
class PortTakenByOther extends Error {}

async function startOnce(extraEnv: Record<string, string>, options: BuiltServerOptions): Promise<BuiltServer> {
  const [port, devPort, smtpPort] = [await freePort(), await freePort(), await freePort()];
  const chosen = { CAIRN_PORT: String(port), CAIRN_DEV_PORT: String(devPort), CAIRN_SMTP_PORT: String(smtpPort) };
  const ownUrl = `http://127.0.0.1:${extraEnv.CAIRN_PORT ?? port}`;
  const own: Record<string, string> = options.publicUrlIsOwn ? { CAIRN_PUBLIC_URL: ownUrl } : {};
  const env = { ...process.env, ...serverEnv({ ...chosen, ...own, ...extraEnv }) };
  const ours = Object.entries(chosen)
    .filter(([name]) => extraEnv[name] === undefined)
    .map(([, value]) => value);
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
      const message = `server exited with ${code} before serving:\n${out}`;
      const taken = /port (\d+) on \S+ is taken/.exec(out);
      reject(taken && ours.includes(taken[1]!) ? new PortTakenByOther(message) : new Error(message));
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
