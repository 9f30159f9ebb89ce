import { loadConfig } from './config';
import { exitWithError } from './cli-errors';
import { createLogger } from './logger';
import { startServer } from './server';

try {
  const config = loadConfig();
  const logger = createLogger(config.logLevel);
  const running = await startServer(config, logger);
  process.stdout.write(`Cairn is serving at ${running.url}\n`);
  if (running.dev) {
    process.stdout.write(`  local sign-in provider and mailbox: ${running.dev.url} (mail: ${running.dev.url}/mail)\n`);
    process.stdout.write(`  local mail catcher (SMTP): ${config.host}:${running.dev.smtpPort}\n`);
  }
  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'shutting down');
    running.close().then(
      () => process.exit(0),
      (err: unknown) => exitWithError('shutdown', err),
    );
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
} catch (err) {
  exitWithError('start', err);
}
