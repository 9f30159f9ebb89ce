import { loadConfig, ConfigError } from './config';
import { exitWithError } from './cli-errors';
import type { ServerContext } from './context';
import { createDataSource } from './db/data-source';
import { Database } from './db/database';
import { startJobs } from './jobs/jobs';
import { createLogger } from './logger';
import { createMailer } from './mail/mailer';
import { stopOnSignals } from './stop-on-signals';

/**
 * `node dist/worker.js`: only the run workers, no HTTP. Same configuration and database as the server
 * (CAIRN_RUN_CONCURRENCY runs at once, 1 by default); mail goes to the configured SMTP host, which is
 * the server's local catcher when it runs the stand-ins. Stops cleanly on SIGTERM and SIGINT: runs in
 * progress go back to the queue for another worker.
 */
try {
  const config = loadConfig();
  if (config.runConcurrency < 1) throw new ConfigError('invalid configuration in the environment:\n  CAIRN_RUN_CONCURRENCY: a worker process needs at least 1');
  const logger = createLogger(config.logLevel);
  const db = new Database(createDataSource(config.databaseUrl), logger);
  const mailer = createMailer(config.smtp, config.mailFrom, logger, { localCatcher: config.devServices });
  const ctx: ServerContext = { config, db, logger, mailer, signIn: undefined };
  const jobs = startJobs(ctx);
  jobs.ready.then(
    () => process.stdout.write(`Cairn run workers are taking jobs (${jobs.concurrency} at once, worker ${jobs.worker})\n`),
    () => {},
  );
  stopOnSignals(logger, 'run workers', async () => {
    await jobs.close();
    mailer.close();
    await db.close();
  });
} catch (err) {
  exitWithError('start', err);
}
