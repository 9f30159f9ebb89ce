import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * What the run queue needs beyond the data model: a cancel request a worker polls for, the heartbeat a
 * working attempt writes (so a run whose worker died can be told from one still being worked on), and
 * an index for listing runs newest first.
 */
export class RunQueueColumns1764810000000 implements MigrationInterface {
  name = 'RunQueueColumns1764810000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE runs ADD COLUMN cancel_requested_at timestamptz`);
    await q.query(`ALTER TABLE runs ADD COLUMN heartbeat_at timestamptz`);
    await q.query(`CREATE INDEX runs_created_at_id ON runs (created_at DESC, id DESC)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX runs_created_at_id`);
    await q.query(`ALTER TABLE runs DROP COLUMN heartbeat_at`);
    await q.query(`ALTER TABLE runs DROP COLUMN cancel_requested_at`);
  }
}
