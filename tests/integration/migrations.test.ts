import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource, createLogger, Database, demoIdentities, loadDemoData, User } from '@cairn/server';
import { databaseUrl } from '../support/test-env';

const db = new Database(createDataSource(databaseUrl()), createLogger('silent'));

beforeAll(() => db.connect());
afterAll(() => db.close());

describe('migrations and demo data on the real PostgreSQL', () => {
  it('has applied every migration, and a second run applies none', async () => {
    const source = await db.connect();
    expect(await source.showMigrations()).toBe(false);
    expect(await db.runMigrations()).toEqual([]);
  });

  it('keeps roles to the three the design names', async () => {
    const source = await db.connect();
    const rows = (await source.query(`SELECT unnest(enum_range(NULL::user_role))::text AS role`)) as { role: string }[];
    expect(rows.map((r) => r.role)).toEqual(['admin', 'researcher', 'viewer']);
    await expect(source.query(`INSERT INTO users (github_id, login, role) VALUES (1, 'x', 'owner')`)).rejects.toThrow(/invalid input value for enum/);
  });

  it('loads the demo members, and loading again changes nothing', async () => {
    const source = await db.connect();
    await loadDemoData(source);
    const before = await source.getRepository(User).count();
    await loadDemoData(source);
    // Other test files add members of their own to this database; the demo's are all there, once.
    expect(await source.getRepository(User).count()).toBe(before);
    const users = await source.getRepository(User).find({ order: { login: 'ASC' } });
    const logins = users.map((u) => u.login);
    for (const i of demoIdentities) expect(logins.filter((l) => l === i.login)).toEqual([i.login]);
    expect(users.find((u) => u.login === 'ines-marlow')?.role).toBe('admin');
  });
});
