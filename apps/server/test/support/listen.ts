import { createServer, type RequestListener, type Server } from 'node:http';
import type { Express } from 'express';
import { closeAuth } from '../../src/auth/install-auth';
import { listen } from '../../src/http/listen';

/** A server under test on a loopback port of its own. */
export interface Listening {
  /** `http://127.0.0.1:<port>`, without a trailing slash. */
  url: string;
  server: Server;
  /** Stops the server; open keep-alive sockets (an unread body, a stream) do not hold it up. */
  close(): Promise<void>;
}

/**
 * Serves `handler` on 127.0.0.1 at a port the system picks. Without a handler, attach one later with
 * `server.on('request', …)` (for an app that must know its own URL before it is made).
 */
export async function listenOnLoopback(handler?: RequestListener): Promise<Listening> {
  const server = createServer(handler);
  const port = await listen(server, '127.0.0.1', 0, 'a test server');
  return {
    url: `http://127.0.0.1:${port}`,
    server,
    close: () =>
      new Promise<void>((resolve) => {
        if (!server.listening) return resolve();
        server.close(() => resolve());
        // Nothing is in flight when a test closes; what a test left open is cut rather than waited for.
        server.closeAllConnections();
      }),
  };
}

/** An Express app under test, served on loopback. */
export interface ServedApp extends Listening {
  app: Express;
}

/** listenOnLoopback for an Express app; close also closes what installAuth opened (the session store's pool). */
export async function serveApp(app: Express): Promise<ServedApp> {
  const listening = await listenOnLoopback(app);
  return {
    ...listening,
    app,
    close: async () => {
      await listening.close();
      await closeAuth(app);
    },
  };
}
