import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RunQueueColumns1764810000000 } from '../src/migrations/1764810000000-run-queue-columns';
import { createTestDatabase, type TestDatabase } from './support/test-database';

// The run queue's migration: the columns the workers poll and write, undone and applied again cleanly.
let t: TestDatabase;
beforeAll(async () => {
  t = await createTestDatabase('runs_migration');
});
afterAll(() => t?.drop());

const queueColumns = async () => {
  const rows = (await (await t.db.connect()).query(
    `SELECT column_name FROM information_schema.columns WHERE table_name = 'runs' AND column_name IN ('cancel_requested_at', 'heartbeat_at') ORDER BY column_name`,
  )) as { column_name: string }[];
  return rows.map((r) => r.column_name);
};

describe('the run queue migration', () => {
  it('adds the cancel request and heartbeat columns, and its down step removes them', async () => {
    expect(await queueColumns()).toEqual(['cancel_requested_at', 'heartbeat_at']);
    const runner = (await t.db.connect()).createQueryRunner();
    try {
      const migration = new RunQueueColumns1764810000000();
      await migration.down(runner);
      expect(await queueColumns()).toEqual([]);
      await migration.up(runner);
      expect(await queueColumns()).toEqual(['cancel_requested_at', 'heartbeat_at']);
    } finally {
      await runner.release();
    }
  });
});
