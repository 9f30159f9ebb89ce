import type { EntityManager } from 'typeorm';
import { HttpError } from '../http/errors';
import type { MemberActor } from './graphs';
import { queryRows } from './run-row';
import type { MemberLimits } from '../config';

/**
 * Serialises a member's submissions (runs and sweeps) until the caller's transaction ends, so a count of
 * their active runs taken after it stays true until the insert commits: two submissions at once cannot
 * both see room for one more. It also makes identical requests of the member find one run.
 */
export async function lockMemberSubmissions(manager: EntityManager, ownerId: string): Promise<void> {
  await manager.query(`SELECT pg_advisory_xact_lock(hashtextextended($1, 0))`, [`cairn:submissions:${ownerId}`]);
}

// Both counts read the partial index runs_active_by_owner (queued and running runs only).
const ACTIVE = `status IN ('queued', 'running')`;

/** Runs outside sweeps the member has queued or running, counted up to `upTo` (enough to compare with a limit). */
async function activeRunsUpTo(manager: EntityManager, ownerId: string, upTo: number): Promise<number> {
  const [row] = await queryRows<{ n: number }>(
    manager,
    `SELECT count(*)::int AS n FROM (SELECT 1 FROM runs WHERE owner_id = $1 AND sweep_id IS NULL AND ${ACTIVE} LIMIT $2) AS active`,
    [ownerId, upTo],
  );
  return row!.n;
}

/** Sweeps of the member with at least one run queued or running. */
async function activeSweeps(manager: EntityManager, ownerId: string): Promise<number> {
  const [row] = await queryRows<{ n: number }>(manager, `SELECT count(DISTINCT sweep_id)::int AS n FROM runs WHERE owner_id = $1 AND sweep_id IS NOT NULL AND ${ACTIVE}`, [ownerId]);
  return row!.n;
}

/**
 * 429 too_many_active_runs when the member already has as many runs (outside sweeps) queued or running as
 * their role allows. Call it under lockMemberSubmissions, in the transaction that inserts the run.
 */
export async function assertRoomForRun(manager: EntityManager, actor: MemberActor, limits: MemberLimits): Promise<void> {
  const limit = limits.activeRuns;
  if ((await activeRunsUpTo(manager, actor.user.id, limit)) < limit) return;
  // Refused: the exact figure for the message (it exceeds the limit only after the limit was lowered).
  const active = await activeRunsUpTo(manager, actor.user.id, Number.MAX_SAFE_INTEGER);
  throw new HttpError(
    429,
    'too_many_active_runs',
    `you have ${active} runs queued or running; a ${actor.user.role} may have at most ${limit} at once: wait for one to finish, or cancel one`,
    { limit, active, role: actor.user.role },
  );
}

/** 429 too_many_active_sweeps when the member has as many sweeps in progress as their role allows. */
export async function assertRoomForSweep(manager: EntityManager, actor: MemberActor, limits: MemberLimits): Promise<void> {
  const limit = limits.activeSweeps;
  const active = await activeSweeps(manager, actor.user.id);
  if (active < limit) return;
  throw new HttpError(
    429,
    'too_many_active_sweeps',
    `you have ${active} sweeps with runs queued or running; a ${actor.user.role} may have at most ${limit} at once: wait for one to finish, or cancel its runs`,
    { limit, active, role: actor.user.role },
  );
}
