import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The per-member limits count a member's queued and running runs at every submission: a partial index
 * holds only those (a few per member), so the count stays cheap however many finished runs there are.
 */
export class ActiveRunsIndex1764900000000 implements MigrationInterface {
  name = 'ActiveRunsIndex1764900000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE INDEX runs_active_by_owner ON runs (owner_id, sweep_id) WHERE status IN ('queued', 'running')`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX runs_active_by_owner`);
  }
}
