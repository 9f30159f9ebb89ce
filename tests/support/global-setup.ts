import pg from 'pg';
import { createDataSource, createLogger, Database } from '@cairn/server';
import { databaseUrl, testDb } from './test-env';

/** Re-creates the test database from nothing and applies every migration, once per test run. */
export default async function setup(): Promise<void> {
  const admin = new pg.Client({ connectionString: databaseUrl('postgres') });
  try {
    await admin.connect();
  } catch (err) {
    throw new Error(
      `no PostgreSQL at ${testDb.host}:${testDb.port} (${(err as Error).message}); run the tests through the README test command, or start it with pnpm db:start`,
    );
  }
  await admin.query(`DROP DATABASE IF EXISTS ${testDb.name} WITH (FORCE)`);
  await admin.query(`CREATE DATABASE ${testDb.name}`);
  await admin.end();
  const db = new Database(createDataSource(databaseUrl()), createLogger('warn'));
  await db.runMigrations();
  await db.close();
}
