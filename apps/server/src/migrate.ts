import { loadConfig } from './config';
import { exitWithError } from './cli-errors';
import { createDataSource } from './db/data-source';
import { Database } from './db/database';
import { createLogger } from './logger';

try {
  const config = loadConfig();
  const db = new Database(createDataSource(config.databaseUrl), createLogger(config.logLevel));
  const applied = await db.runMigrations();
  await db.close();
  process.stdout.write(applied.length ? `applied ${applied.length} migration(s): ${applied.join(', ')}\n` : 'database schema is up to date\n');
} catch (err) {
  exitWithError('migration', err);
}
