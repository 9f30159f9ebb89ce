import type { RunStatus, SolveMethod, Visibility } from '@cairn/schema';
import type { DataSource, EntityManager } from 'typeorm';
import { preparedRows } from '../db/prepared-rows';

/**
 * A run as the queries of the run services read it: the runs table (with the queue's columns, which the
 * Run entity does not map) and the owner's login.
 */
export interface RunRow {
  id: string;
  owner_id: string;
  owner_login: string;
  spec: Record<string, unknown>;
  graph_id: string | null;
  graph_key: string;
  family: string;
  method: SolveMethod;
  time_limit_seconds: number | null;
  status: RunStatus;
  progress: Record<string, unknown> | null;
  /** Only in full rows (RUN_COLUMNS), not in summaries. */
  result?: Record<string, unknown> | null;
  certificate?: number[] | null;
  lower: number | null;
  upper: number | null;
  rank_number: number | null;
  provenance: { value?: string } | null;
  error: { code: string; message: string } | null;
  visibility: Visibility;
  share_token: string | null;
  sweep_id: string | null;
  worker: string | null;
  attempts: number;
  created_at: Date;
  started_at: Date | null;
  finished_at: Date | null;
  cancel_requested_at: Date | null;
}

const SUMMARY = `r.id, r.owner_id, u.login AS owner_login, r.spec, r.graph_id, r.graph_key, r.family, r.method, r.time_limit_seconds,
  r.status, r.progress, r.lower, r.upper, r.rank_number, r.provenance, r.error, r.visibility, r.share_token, r.sweep_id,
  r.worker, r.attempts, r.created_at, r.started_at, r.finished_at, r.cancel_requested_at`;

/** Columns of a run summary (no result, no certificate: lists stay small). */
export const RUN_SUMMARY_COLUMNS = SUMMARY;
/** Columns of a whole run. */
export const RUN_COLUMNS = `${SUMMARY}, r.result, r.certificate`;
/** The FROM clause both read from (`r` the run, `u` its owner). */
export const RUN_FROM = `FROM runs r JOIN users u ON u.id = r.owner_id`;

/** The rows of a query; TypeORM answers UPDATE and DELETE with [rows, count], everything else with rows. */
export async function queryRows<T>(db: DataSource | EntityManager, sql: string, params: unknown[] = []): Promise<T[]> {
  const raw = (await db.query(sql, params)) as unknown;
  if (Array.isArray(raw) && raw.length === 2 && Array.isArray(raw[0]) && typeof raw[1] === 'number') return raw[0] as T[];
  return raw as T[];
}

const LOAD_RUN = `SELECT ${RUN_COLUMNS} ${RUN_FROM} WHERE r.id = $1`;

/** One whole run by id, or undefined (a prepared statement: the run page and its API read it often). */
export async function loadRunRow(db: DataSource | EntityManager, id: string): Promise<RunRow | undefined> {
  const [row] = await preparedRows<RunRow>(db, LOAD_RUN, [id]);
  return row;
}
