import type { DataSource } from 'typeorm';
import type { Database } from './database';
import { HttpError } from '../http/errors';

/** The data source for a request; 503 (not a 500) while PostgreSQL does not answer. */
export async function connectOrUnavailable(db: Database): Promise<DataSource> {
  try {
    return await db.connect();
  } catch {
    throw new HttpError(503, 'database_unavailable', 'the database does not answer; try again shortly');
  }
}
