import type { SweepRequest, SweepView } from '@cairn/schema';
import { MAX_SWEEP_CELLS } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import type { ServerContext } from '../context';
import { HttpError } from '../http/errors';
import { runQueueSender } from '../jobs/run-queue';
import { graphKeyOf } from './graph-key';
import type { MemberActor } from './graphs';
import { assertRoomForSweep, lockMemberSubmissions } from './active-runs';
import { limitsOf, tooLargeFor } from './run-limits';
import { queryRows } from './run-row';
import { plannedSize, specTextOf } from './run-spec';
import { insertRun } from './runs';
import { distinctRuns, sweepCells } from './sweeps-cells';
import { loadSweepView } from './sweeps-view';

const field = (name: string, message: string) => new HttpError(400, 'invalid_request', `${name}: ${message}`, { problems: [{ field: name, message }] });

/** The smallest sizes each family can be built with (a cycle needs 3 vertices). */
const MINIMUM: Record<SweepRequest['family'], { rows: number; cols: number }> = {
  grid: { rows: 1, cols: 1 },
  cylinder: { rows: 1, cols: 3 },
  torus: { rows: 3, cols: 3 },
};

/**
 * POST /api/v1/sweeps: one run per distinct graph of the table, all inserted with their jobs in one
 * transaction (a sweep is queued whole or not at all). Grids and tori compute each transposed pair
 * once; the table shows the shared run in both cells. Each cell must fit the caller's role (413), and
 * the caller may have only so many sweeps in progress (429 too_many_active_sweeps).
 */
export async function createSweep(ctx: ServerContext, source: DataSource, actor: MemberActor, request: SweepRequest): Promise<SweepView> {
  const min = MINIMUM[request.family];
  if (request.rows.from < min.rows) throw field('body.rows.from', `a ${request.family} needs at least ${min.rows} rows`);
  if (request.cols.from < min.cols) throw field('body.cols.from', `a ${request.family} needs at least ${min.cols} columns (they close into cycles)`);
  const ranges = { family: request.family, rowsFrom: request.rows.from, rowsTo: request.rows.to, colsFrom: request.cols.from, colsTo: request.cols.to };
  const cellCount = (ranges.rowsTo - ranges.rowsFrom + 1) * (ranges.colsTo - ranges.colsFrom + 1);
  if (cellCount > MAX_SWEEP_CELLS) throw field('body.cols.to', `the sweep has ${cellCount} cells; a sweep may have at most ${MAX_SWEEP_CELLS} (split it into several)`);
  // The largest cell (rowsTo x colsTo) has the most vertices and edges; the role's graph limit applies to it.
  const limits = limitsOf(ctx.config, actor.user.role);
  const largest = plannedSize({ family: request.family, rows: ranges.rowsTo, cols: ranges.colsTo });
  const tooLarge = tooLargeFor(`body.cols.to: the largest cell, ${ranges.rowsTo} x ${ranges.colsTo},`, largest.vertices, largest.edges, actor.user.role, limits);
  if (tooLarge) throw new HttpError(413, 'graph_too_large', tooLarge, { problems: [{ field: 'body.cols.to', message: 'a cell is too large for a run' }] });
  const runs = distinctRuns(sweepCells(ranges));
  const name = request.name ?? `${request.family} ${ranges.rowsFrom}..${ranges.rowsTo} x ${ranges.colsFrom}..${ranges.colsTo}`;
  const visibility = request.visibility ?? 'private';
  await runQueueSender(source);
  const sweepId = await source.transaction(async (manager) => {
    // A sweep's runs count against the limit of active sweeps, not one by one against the active runs.
    await lockMemberSubmissions(manager, actor.user.id);
    await assertRoomForSweep(manager, actor, limits);
    const [sweep] = await queryRows<{ id: string }>(
      manager,
      `INSERT INTO sweeps (owner_id, name, family, rows_from, rows_to, cols_from, cols_to, method, time_limit_seconds, visibility)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10) RETURNING id`,
      [actor.user.id, name, request.family, ranges.rowsFrom, ranges.rowsTo, ranges.colsFrom, ranges.colsTo, request.method, request.timeLimitSeconds, visibility],
    );
    for (const { rows, cols } of runs) {
      const spec = { family: request.family, rows, cols };
      const { vertices, edges } = plannedSize(spec);
      await insertRun(manager, {
        ownerId: actor.user.id,
        graph: { spec, specText: specTextOf(spec), key: graphKeyOf(spec), graphId: null, vertexCount: vertices, edgeCount: edges },
        method: request.method,
        timeLimitSeconds: request.timeLimitSeconds,
        visibility,
        sweepId: sweep!.id,
      });
    }
    return sweep!.id;
  });
  ctx.logger.info({ sweep: sweepId, cells: cellCount, runs: runs.length }, 'sweep queued');
  return (await loadSweepView(source, sweepId))!;
}
