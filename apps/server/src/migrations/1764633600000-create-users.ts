import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateUsers1764633600000 implements MigrationInterface {
  name = 'CreateUsers1764633600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TYPE user_role AS ENUM ('admin', 'researcher', 'viewer')`);
    await q.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        github_id bigint NOT NULL UNIQUE,
        login text NOT NULL,
        display_name text,
        email text,
        role user_role NOT NULL DEFAULT 'viewer',
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE users');
    await q.query('DROP TYPE user_role');
  }
}
