import { exitWithError } from './cli-errors';
import type { Logger } from './logger';

/** Runs `close` once on the first SIGINT or SIGTERM, then exits 0 (or names what failed on the way down). */
export function stopOnSignals(logger: Logger, what: string, close: () => Promise<void>): void {
  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, `${what} shutting down`);
    close().then(
      () => process.exit(0),
      (err: unknown) => exitWithError('shutdown', err),
    );
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
}
