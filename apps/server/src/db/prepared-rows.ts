import { createHash } from 'node:crypto';
import type pg from 'pg';
import type { DataSource, EntityManager } from 'typeorm';
import { pgPoolOf } from './pg-pool';

/** Statement names by SQL text: a name is the text's hash, so one text always gets the same name. */
const names = new Map<string, string>();

function statementName(text: string): string {
  let name = names.get(text);
  if (name === undefined) {
    name = `cairn_${createHash('sha1').update(text).digest('hex').slice(0, 24)}`;
    names.set(text, name);
  }
  return name;
}

/**
 * The rows of a fixed SQL text run as a named prepared statement: PostgreSQL parses and plans it once
 * per connection instead of on every call (TypeORM's query() sends an unnamed statement, planned each
 * time; for the key lookup and the run read, planning cost more than running). On the data source's pg
 * pool, or on the connection of the open transaction when given a transaction's manager, so a read in a
 * transaction still sees that transaction. Only for texts written in the code, never built from input:
 * each connection keeps every statement it has prepared.
 */
export async function preparedRows<T>(db: DataSource | EntityManager, text: string, values: unknown[]): Promise<T[]> {
  const query = { name: statementName(text), text, values };
  const runner = 'queryRunner' in db ? db.queryRunner : undefined;
  if (runner && !runner.isReleased) {
    const client = (await runner.connect()) as pg.PoolClient;
    return (await client.query(query)).rows as T[];
  }
  const source = 'driver' in db ? db : db.connection;
  return (await pgPoolOf(source).query(query)).rows as T[];
}
