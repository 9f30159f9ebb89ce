import { loadConfig } from './config';
import { exitWithError } from './cli-errors';
import { createLogger } from './logger';
import { startServer } from './server';
import { stopOnSignals } from './stop-on-signals';

try {
  const config = loadConfig();
  const logger = createLogger(config.logLevel);
  const running = await startServer(config, logger);
  process.stdout.write(`Cairn is serving at ${running.url}\n`);
  if (running.dev) {
    process.stdout.write(`  local sign-in provider and mailbox: ${running.dev.url} (mail: ${running.dev.url}/mail)\n`);
    process.stdout.write(`  local mail catcher (SMTP): ${config.host}:${running.dev.smtpPort}\n`);
  }
  stopOnSignals(logger, 'server', () => running.close());
} catch (err) {
  exitWithError('start', err);
}
