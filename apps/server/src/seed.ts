import { loadConfig } from './config';
import { exitWithError } from './cli-errors';
import { createDataSource } from './db/data-source';
import { Database } from './db/database';
import { loadDemoData } from './demo/load-demo-data';
import { loadDemoWork } from './demo/load-demo-work';
import { createLogger } from './logger';
import { createMailer } from './mail/mailer';

try {
  const config = loadConfig();
  // Quiet unless something is wrong: the start command prints its own summary below.
  const logger = createLogger(config.logLevel === 'info' ? 'warn' : config.logLevel);
  const db = new Database(createDataSource(config.databaseUrl), logger);
  const source = await db.connect();
  const loaded = await loadDemoData(source);
  // Seeding sends no mail; the mailer is there because the run services take a full context.
  const mailer = createMailer(config.smtp, config.mailFrom, logger, { localCatcher: true });
  const work = await loadDemoWork({ config, db, logger, mailer, signIn: undefined }, source);
  mailer.close();
  await db.close();
  process.stdout.write(`demo data loaded: ${loaded.users} members, ${work.runs} new runs, ${work.sweeps} new sweeps, ${work.uploads} new uploads\n`);
  process.stdout.write(`demo API key (researcher tobias-quell): ${loaded.apiKey}\n`);
} catch (err) {
  exitWithError('loading the demo data', err);
}
