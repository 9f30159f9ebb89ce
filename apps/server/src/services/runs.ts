import { createHash } from 'node:crypto';
import type { RunRequest, RunView, SolveMethod, Visibility } from '@cairn/schema';
import type { DataSource, EntityManager } from 'typeorm';
import type { ServerContext } from '../context';
import { enqueueRun, runQueueSender } from '../jobs/run-queue';
import { assertRoomForRun, lockMemberSubmissions } from './active-runs';
import type { MemberActor } from './graphs';
import { limitsOf } from './run-limits';
import { loadRunRow, queryRows } from './run-row';
import { newShareToken } from './run-share-token';
import { resolveRunGraph, type RunGraph } from './run-spec';
import { toRunView } from './run-view';

/** What makes two requests identical: the same owner, graph, method and limits. */
export function requestHashOf(ownerId: string, graphKey: string, method: SolveMethod, timeLimitSeconds: number): string {
  return createHash('sha256').update(JSON.stringify({ ownerId, graphKey, method, timeLimitSeconds })).digest('hex');
}

export interface NewRun {
  ownerId: string;
  graph: RunGraph;
  method: SolveMethod;
  timeLimitSeconds: number;
  visibility: Visibility;
  sweepId?: string;
}

/** Inserts a run and its job in the caller's transaction; returns the run's id. */
export async function insertRun(manager: EntityManager, run: NewRun): Promise<string> {
  const [row] = await queryRows<{ id: string }>(
    manager,
    `INSERT INTO runs (owner_id, spec, graph_id, graph_key, family, method, time_limit_seconds, request_hash, visibility, share_token, sweep_id)
     VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11) RETURNING id`,
    [
      run.ownerId,
      run.graph.spec,
      run.graph.graphId,
      run.graph.key.key,
      run.graph.key.family,
      run.method,
      run.timeLimitSeconds,
      requestHashOf(run.ownerId, run.graph.key.key, run.method, run.timeLimitSeconds),
      run.visibility,
      run.visibility === 'link' ? newShareToken() : null,
      run.sweepId ?? null,
    ],
  );
  await enqueueRun(manager, row!.id, run.timeLimitSeconds);
  return row!.id;
}

/**
 * POST /api/v1/runs: a new queued run, or the caller's identical run when one is queued, running or
 * done (`created` false), so a repeated request never computes twice. A member's submissions are
 * serialised (lockMemberSubmissions), so concurrent identical requests find one run and concurrent new
 * ones cannot pass the member's limit of active runs together (429 too_many_active_runs, nothing stored).
 */
export async function createRun(ctx: ServerContext, source: DataSource, actor: MemberActor, request: RunRequest): Promise<{ run: RunView; created: boolean }> {
  const limits = limitsOf(ctx.config, actor.user.role);
  const graph = await resolveRunGraph(source, actor, request, limits);
  await runQueueSender(source);
  const ownerId = actor.user.id;
  const hash = requestHashOf(ownerId, graph.key.key, request.method, request.timeLimitSeconds);
  const { id, created } = await source.transaction(async (manager) => {
    await lockMemberSubmissions(manager, ownerId);
    const [existing] = await queryRows<{ id: string }>(
      manager,
      `SELECT id FROM runs WHERE owner_id = $1 AND request_hash = $2 AND status IN ('queued', 'running', 'done') ORDER BY created_at DESC LIMIT 1`,
      [ownerId, hash],
    );
    if (existing) return { id: existing.id, created: false };
    await assertRoomForRun(manager, actor, limits);
    const newId = await insertRun(manager, { ownerId, graph, method: request.method, timeLimitSeconds: request.timeLimitSeconds, visibility: request.visibility ?? 'private' });
    return { id: newId, created: true };
  });
  const row = await loadRunRow(source, id);
  ctx.logger.info({ run: id, graph: graph.specText, created }, created ? 'run queued' : 'identical run returned');
  return { run: toRunView(row!, ctx.config.publicUrl), created };
}
