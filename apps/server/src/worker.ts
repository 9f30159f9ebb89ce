import { loadConfig, ConfigError } from './config';
import { exitWithError } from './cli-errors';
import type { ServerContext } from './context';
import { createDataSource } from './db/data-source';
import { Database } from './db/database';
import { startJobs } from './jobs/jobs';
import { createLogger } from './logger';
import { createMailer } from './mail/mailer';

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
  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'run workers shutting down');
    jobs
      .close()
      .then(async () => {
        mailer.close();
        await db.close();
      })
      .then(
        () => process.exit(0),
        (err: unknown) => exitWithError('shutdown', err),
      );
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
} catch (err) {
  exitWithError('start', err);
}
