import { loadConfig } from './config';
import { exitWithError } from './cli-errors';
import { createDataSource } from './db/data-source';
import { Database } from './db/database';
import { loadDemoData } from './demo/load-demo-data';
import { createLogger } from './logger';

try {
  const config = loadConfig();
  const db = new Database(createDataSource(config.databaseUrl), createLogger(config.logLevel));
  const loaded = await loadDemoData(await db.connect());
  await db.close();
  process.stdout.write(`demo data loaded: ${loaded.users} members\n`);
} catch (err) {
  exitWithError('loading the demo data', err);
}
