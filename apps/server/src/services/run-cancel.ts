import type { RunView } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import { HttpError } from '../http/errors';
import type { MemberActor } from './graphs';
import { findOwnRun } from './run-access';
import { loadRunRow, queryRows } from './run-row';
import { toRunView } from './run-view';

/**
 * Cancels a run in one statement: a queued run is cancelled at once; a running one is asked to stop
 * (its worker polls the request, stops the search and stores the best interval it reached). Returns
 * the status the run had; finished runs are left alone.
 */
export async function requestCancel(source: DataSource, id: string): Promise<string | undefined> {
  const [row] = await queryRows<{ status: string }>(
    source,
    `UPDATE runs SET
       status = CASE WHEN status = 'queued' THEN 'cancelled' ELSE status END,
       finished_at = CASE WHEN status = 'queued' THEN now() ELSE finished_at END,
       cancel_requested_at = COALESCE(cancel_requested_at, now()),
       updated_at = now()
     WHERE id = $1 AND status IN ('queued', 'running')
     RETURNING status`,
    [id],
  );
  return row?.status;
}

/** POST /api/v1/runs/:id/cancel (owner or admin); 409 for a run that has already finished. */
export async function cancelRun(source: DataSource, actor: MemberActor, id: string, publicUrl: string): Promise<RunView> {
  const row = await findOwnRun(source, actor, id, 'cancel it');
  const status = await requestCancel(source, id);
  if (status === undefined) throw new HttpError(409, 'run_finished', `the run is already ${row.status}; there is nothing to cancel`);
  return toRunView((await loadRunRow(source, id))!, publicUrl);
}

/**
 * DELETE /api/v1/runs/:id (owner or admin). A running run is asked to stop first; its worker then finds
 * the run gone and stores nothing. Atlas entries keep their values (their run references become null).
 */
export async function deleteRun(source: DataSource, actor: MemberActor, id: string): Promise<void> {
  await findOwnRun(source, actor, id, 'delete it');
  await requestCancel(source, id);
  await source.query(`DELETE FROM runs WHERE id = $1`, [id]);
}
