import type { RunList, RunListQuery } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import { seesEveryRun } from '../auth/actor';
import { HttpError } from '../http/errors';
import type { MemberActor } from './graphs';
import { queryRows, RUN_FROM, RUN_SUMMARY_COLUMNS, type RunRow } from './run-row';
import { toRunSummary } from './run-view';

/** A page boundary: the (created_at, id) of the last run of the page, newest first. */
function decodeCursor(cursor: string): { createdAt: string; id: string } {
  const text = Buffer.from(cursor, 'base64url').toString('utf8');
  const m = /^(\d{4}-\d\d-\d\dT[\d:.]+Z)\|([0-9a-f-]{36})$/.exec(text);
  if (!m) throw new HttpError(400, 'invalid_request', 'query.cursor: not a cursor of this list (pass nextCursor of the previous page)', { problems: [{ field: 'query.cursor', message: 'not a cursor' }] });
  return { createdAt: m[1]!, id: m[2]! };
}

const encodeCursor = (row: RunRow) => Buffer.from(`${new Date(row.created_at).toISOString()}|${row.id}`).toString('base64url');

/**
 * GET /api/v1/runs: newest first. Members see their own runs and public ones; admins see every run.
 * Pages by `cursor` (stable while runs are added) or by `offset`.
 */
export async function listRuns(source: DataSource, actor: MemberActor, query: RunListQuery, publicUrl: string): Promise<RunList> {
  if (query.cursor !== undefined && query.offset !== undefined) {
    throw new HttpError(400, 'invalid_request', 'query.offset: give cursor or offset, not both', { problems: [{ field: 'query.offset', message: 'give cursor or offset, not both' }] });
  }
  const where: string[] = [];
  const params: unknown[] = [];
  const param = (v: unknown) => {
    params.push(v);
    return `$${params.length}`;
  };
  if (!seesEveryRun(actor)) where.push(`(r.owner_id = ${param(actor.user.id)} OR r.visibility = 'public')`);
  if (query.status) where.push(`r.status = ${param(query.status)}`);
  if (query.family) where.push(`r.family = ${param(query.family)}`);
  if (query.sweepId) where.push(`r.sweep_id = ${param(query.sweepId)}`);
  if (query.owner === 'me') where.push(`r.owner_id = ${param(actor.user.id)}`);
  else if (query.owner) where.push(`u.login = ${param(query.owner)}`);
  if (query.cursor) {
    const c = decodeCursor(query.cursor);
    where.push(`(r.created_at, r.id) < (${param(c.createdAt)}::timestamptz, ${param(c.id)}::uuid)`);
  }
  const sql = `SELECT ${RUN_SUMMARY_COLUMNS} ${RUN_FROM} ${where.length ? `WHERE ${where.join(' AND ')}` : ''}
    ORDER BY r.created_at DESC, r.id DESC LIMIT ${param(query.limit + 1)} OFFSET ${param(query.offset ?? 0)}`;
  const rows = await queryRows<RunRow>(source, sql, params);
  const page = rows.slice(0, query.limit);
  return { runs: page.map((r) => toRunSummary(r, publicUrl)), nextCursor: rows.length > query.limit ? encodeCursor(page[page.length - 1]!) : null };
}
