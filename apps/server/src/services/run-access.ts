import type { Request } from 'express';
import type { DataSource, EntityManager } from 'typeorm';
import { seesEveryRun } from '../auth/actor';
import { actorOf, requireUser } from '../auth/require';
import { HttpError } from '../http/errors';
import type { MemberActor } from './graphs';
import { loadRunRow, type RunRow } from './run-row';

/** Whether an actor may read a run by its id: their own, a public one, or any run for an admin. */
export function canSeeRun(actor: MemberActor, row: Pick<RunRow, 'owner_id' | 'visibility'>): boolean {
  return row.owner_id === actor.user.id || row.visibility === 'public' || seesEveryRun(actor);
}

const notFound = (id: string) => new HttpError(404, 'not_found', `no run ${id}`);

/** A run the actor may read; a private run of someone else is 404, as if it did not exist. */
export async function findVisibleRun(db: DataSource | EntityManager, actor: MemberActor, id: string): Promise<RunRow> {
  const row = await loadRunRow(db, id);
  if (!row || !canSeeRun(actor, row)) throw notFound(id);
  return row;
}

/** A run the actor may change: their own, or any for an admin (403 for a visible run of someone else). */
export async function findOwnRun(db: DataSource | EntityManager, actor: MemberActor, id: string, doing: string, adminToo = true): Promise<RunRow> {
  const row = await findVisibleRun(db, actor, id);
  if (row.owner_id !== actor.user.id && !(adminToo && seesEveryRun(actor))) {
    throw new HttpError(403, 'forbidden', `only the run's owner${adminToo ? ' (or an admin)' : ''} may ${doing}`);
  }
  return row;
}

/** The member behind a request (401 for anonymous ones): routes guarded by a member's permission use it. */
export function memberActorOf(req: Request): MemberActor {
  requireUser(req);
  return actorOf(req) as MemberActor;
}
