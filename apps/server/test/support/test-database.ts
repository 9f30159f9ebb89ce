import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { createDataSource, createLogger, Database } from '../../src/index';

const host = '127.0.0.1';
const port = Number(process.env.CAIRN_DB_PORT ?? 54780);
const user = process.env.CAIRN_DB_USER ?? 'cairn';
export const databaseUrlFor = (name: string) => `postgres://${user}@${host}:${port}/${name}`;

/** A database URL on a port where nothing listens (port 9, discard, is closed on loopback here). */
export const UNREACHABLE_DATABASE_URL = 'postgres://cairn@127.0.0.1:9/cairn_unit';

/** A Database at UNREACHABLE_DATABASE_URL, for the app without its database (no query ever succeeds). */
export const unreachableDatabase = (logger = createLogger('silent')) => new Database(createDataSource(UNREACHABLE_DATABASE_URL), logger);

export interface TestDatabase {
  name: string;
  url: string;
  db: Database;
  /** Drops the database (after closing every connection to it). */
  drop(): Promise<void>;
}

/**
 * A database of its own for one test file on the loopback PostgreSQL the test command starts, with every
 * migration applied. Names end in _test, so nothing but tests is ever dropped.
 */
export async function createTestDatabase(label: string): Promise<TestDatabase> {
  const name = `cairn_${label.replace(/[^a-z0-9]/g, '_')}_${randomBytes(3).toString('hex')}_test`;
  const admin = new pg.Client({ connectionString: databaseUrlFor('postgres') });
  try {
    await admin.connect();
  } catch (err) {
    throw new Error(`no PostgreSQL at ${host}:${port} (${(err as Error).message}); run the README test command, or pnpm db:start`);
  }
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.end();
  const url = databaseUrlFor(name);
  const db = new Database(createDataSource(url), createLogger('silent'));
  await db.runMigrations();
  return {
    name,
    url,
    db,
    drop: async () => {
      await db.close();
      const again = new pg.Client({ connectionString: databaseUrlFor('postgres') });
      await again.connect();
      await again.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      await again.end();
    },
  };
}
