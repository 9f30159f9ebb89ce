import type pg from 'pg';
import type { DataSource } from 'typeorm';

/** The node-postgres pool behind a TypeORM data source (TypeORM's PostgreSQL driver keeps it as `master`). */
export function pgPoolOf(source: DataSource): pg.Pool {
  return (source.driver as unknown as { master: pg.Pool }).master;
}
