import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Everything beyond users: keys, uploads, runs, sweeps, the atlas and the session store. */
export class CreateRunsKeysGraphs1764720000000 implements MigrationInterface {
  name = 'CreateRunsKeysGraphs1764720000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE users ADD COLUMN notify_on_finish boolean NOT NULL DEFAULT true`);
    await q.query(`
      CREATE TABLE api_keys (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        name text NOT NULL,
        prefix text NOT NULL UNIQUE,
        secret_hash text NOT NULL UNIQUE,
        scopes text[] NOT NULL CHECK (scopes <@ ARRAY['runs:read', 'runs:write', 'atlas:read']::text[]),
        created_by uuid REFERENCES users(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        last_used_at timestamptz,
        revoked_at timestamptz
      )`);
    await q.query(`CREATE INDEX api_keys_user_id ON api_keys (user_id)`);
    await q.query(`
      CREATE TABLE graphs (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        name text NOT NULL,
        format text NOT NULL,
        sha256 text NOT NULL CHECK (sha256 ~ '^[0-9a-f]{64}$'),
        vertex_count integer NOT NULL CHECK (vertex_count >= 0),
        edge_count integer NOT NULL CHECK (edge_count >= 0),
        size_bytes integer NOT NULL CHECK (size_bytes >= 0),
        content bytea NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (owner_id, sha256)
      )`);
    await q.query(`CREATE INDEX graphs_sha256 ON graphs (sha256)`);
    await q.query(`
      CREATE TABLE sweeps (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        name text NOT NULL,
        family text NOT NULL,
        rows_from integer NOT NULL,
        rows_to integer NOT NULL,
        cols_from integer NOT NULL,
        cols_to integer NOT NULL,
        method text NOT NULL CHECK (method IN ('auto', 'exact', 'bounds', 'formula')),
        time_limit_seconds integer,
        visibility text NOT NULL DEFAULT 'private' CHECK (visibility IN ('private', 'link', 'public')),
        created_at timestamptz NOT NULL DEFAULT now(),
        CHECK (rows_from <= rows_to AND cols_from <= cols_to)
      )`);
    await q.query(`CREATE INDEX sweeps_owner_id ON sweeps (owner_id)`);
    await q.query(`
      CREATE TABLE runs (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        spec jsonb NOT NULL,
        graph_id uuid REFERENCES graphs(id) ON DELETE RESTRICT,
        graph_key text NOT NULL,
        family text NOT NULL,
        method text NOT NULL CHECK (method IN ('auto', 'exact', 'bounds', 'formula')),
        time_limit_seconds integer CHECK (time_limit_seconds > 0),
        request_hash text NOT NULL,
        status text NOT NULL DEFAULT 'queued' CHECK (status IN ('queued', 'running', 'done', 'failed', 'cancelled')),
        progress jsonb,
        result jsonb,
        lower integer,
        upper integer,
        rank_number integer,
        provenance jsonb,
        certificate jsonb,
        witness jsonb,
        stats jsonb,
        error jsonb,
        visibility text NOT NULL DEFAULT 'private' CHECK (visibility IN ('private', 'link', 'public')),
        share_token text UNIQUE,
        sweep_id uuid REFERENCES sweeps(id) ON DELETE CASCADE,
        worker text,
        attempts integer NOT NULL DEFAULT 0,
        created_at timestamptz NOT NULL DEFAULT now(),
        started_at timestamptz,
        finished_at timestamptz,
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK (lower IS NULL OR upper IS NULL OR lower <= upper)
      )`);
    for (const column of ['owner_id', 'graph_key', 'family', 'request_hash', 'status', 'sweep_id']) {
      await q.query(`CREATE INDEX runs_${column} ON runs (${column})`);
    }
    await q.query(`
      CREATE TABLE atlas_entries (
        graph_key text PRIMARY KEY,
        family text NOT NULL,
        sizes jsonb NOT NULL,
        vertex_count integer NOT NULL,
        edge_count integer NOT NULL,
        lower integer NOT NULL,
        upper integer NOT NULL,
        exact boolean NOT NULL DEFAULT false,
        lower_provenance jsonb NOT NULL,
        upper_provenance jsonb NOT NULL,
        lower_run_id uuid REFERENCES runs(id) ON DELETE SET NULL,
        upper_run_id uuid REFERENCES runs(id) ON DELETE SET NULL,
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK (lower <= upper),
        CHECK (exact = (lower = upper))
      )`);
    await q.query(`CREATE INDEX atlas_entries_family ON atlas_entries (family)`);
    // The table connect-pg-simple expects (its own schema, under our name).
    await q.query(`
      CREATE TABLE sessions (
        sid varchar NOT NULL PRIMARY KEY,
        sess json NOT NULL,
        expire timestamp(6) NOT NULL
      )`);
    await q.query(`CREATE INDEX sessions_expire ON sessions (expire)`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['sessions', 'atlas_entries', 'runs', 'sweeps', 'graphs', 'api_keys']) await q.query(`DROP TABLE ${table}`);
    await q.query(`ALTER TABLE users DROP COLUMN notify_on_finish`);
  }
}
