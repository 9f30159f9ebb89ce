import type { Server } from 'node:http';
import type { Server as NetServer } from 'node:net';

/** A port that something else already holds; says which and how to choose another. */
export class PortTakenError extends Error {
  constructor(
    readonly host: string,
    readonly port: number,
    readonly variable: string,
  ) {
    super(`port ${port} on ${host} is taken; set ${variable} to choose another`);
  }
}

/** Starts listening and resolves once bound; a taken port rejects with a PortTakenError. */
export function listen(server: NetServer, host: string, port: number, variable: string): Promise<number> {
  return new Promise((resolve, reject) => {
    const onError = (err: NodeJS.ErrnoException) => {
      server.off('listening', onListening);
      reject(err.code === 'EADDRINUSE' || err.code === 'EACCES' ? new PortTakenError(host, port, variable) : err);
    };
    const onListening = () => {
      server.off('error', onError);
      const address = server.address();
      resolve(typeof address === 'object' && address ? address.port : port);
    };
    server.once('error', onError);
    server.once('listening', onListening);
    server.listen(port, host);
  });
}

/** Stops accepting, ends idle keep-alive sockets at once and the rest after a grace period. */
export function closeServer(server: Server, graceMs = 3000): Promise<void> {
  return new Promise((resolve) => {
    if (!server.listening) return resolve();
    const timer = setTimeout(() => server.closeAllConnections(), graceMs);
    server.close(() => {
      clearTimeout(timer);
      resolve();
    });
    server.closeIdleConnections();
  });
}
