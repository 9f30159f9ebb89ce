import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrations } from '../src/index';
import { createTestDatabase, type TestDatabase } from './support/test-database';

let t: TestDatabase;
beforeAll(async () => {
  t = await createTestDatabase('migrations');
});
afterAll(() => t?.drop());

describe('the schema on the real PostgreSQL', () => {
  it('has every table the design names', async () => {
    const source = await t.db.connect();
    const rows = (await source.query(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`)) as { tablename: string }[];
    expect(rows.map((r) => r.tablename)).toEqual(['api_keys', 'atlas_entries', 'graphs', 'migrations', 'runs', 'sessions', 'sweeps', 'users']);
  });

  it('refuses an atlas entry whose sides cross or whose exact flag lies', async () => {
    const source = await t.db.connect();
    const insert = (lower: number, upper: number, exact: boolean) =>
      source.query(
        `INSERT INTO atlas_entries (graph_key, family, sizes, vertex_count, edge_count, lower, upper, exact, lower_provenance, upper_provenance)
         VALUES ($1, 'grid', '{}', 4, 4, $2, $3, $4, '{}', '{}')`,
        [`grid:${lower}x${upper}:${exact}`, lower, upper, exact],
      );
    await expect(insert(4, 3, false)).rejects.toThrow(/check constraint/);
    await expect(insert(3, 3, false)).rejects.toThrow(/check constraint/);
    await expect(insert(3, 4, true)).rejects.toThrow(/check constraint/);
    await insert(3, 3, true);
  });

  it('refuses an API key scope the design does not name', async () => {
    const source = await t.db.connect();
    const [u] = (await source.query(`INSERT INTO users (github_id, login) VALUES (42, 'scope-check') RETURNING id`)) as { id: string }[];
    await expect(
      source.query(`INSERT INTO api_keys (user_id, name, prefix, secret_hash, scopes) VALUES ($1, 'k', 'cairn_x', 'h', ARRAY['runs:delete'])`, [u!.id]),
    ).rejects.toThrow(/check constraint/);
  });

  it('undoes every migration back to nothing and applies them all again', async () => {
    const source = await t.db.connect();
    for (let i = 0; i < migrations.length; i++) await source.undoLastMigration({ transaction: 'each' });
    const after = (await source.query(`SELECT count(*)::int AS n FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'migrations'`)) as { n: number }[];
    expect(after[0]!.n).toBe(0);
    expect(await t.db.runMigrations()).toEqual(migrations.map((m) => new m().name));
  });
});
