import { createServer } from 'node:net';

// Below Linux's ephemeral range (32768–60999): a port the system hands to an outgoing connection (to
// PostgreSQL, from Chromium) cannot land on one of these between the check here and the server's bind.
const LOW = 20_000;
const HIGH = 32_768;
const handedOut = new Set<number>();

const canBind = (port: number): Promise<boolean> =>
  new Promise((resolve) => {
    const s = createServer();
    s.once('error', () => resolve(false));
    s.listen(port, '127.0.0.1', () => s.close(() => resolve(true)));
  });

/** A loopback port that was free a moment ago, outside the ephemeral range, not handed out before by this process. */
export async function freePort(): Promise<number> {
  for (let attempt = 0; attempt < 200; attempt++) {
    const port = LOW + Math.floor(Math.random() * (HIGH - LOW));
    if (handedOut.has(port) || !(await canBind(port))) continue;
    handedOut.add(port);
    return port;
  }
  throw new Error(`no free loopback port between ${LOW} and ${HIGH - 1} after 200 tries`);
}
