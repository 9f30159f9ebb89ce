import type { RunStatus, SweepCell, SweepCounts, SweepList, SweepListQuery, SweepSummary, SweepView } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import { seesEveryRun } from '../auth/actor';
import { HttpError } from '../http/errors';
import type { MemberActor } from './graphs';
import { queryRows } from './run-row';
import { distinctRuns, MIRRORED_FAMILIES, sweepCells } from './sweeps-cells';
import { closedFormOf } from './sweep-closed-form';

interface SweepRow {
  id: string;
  owner_id: string;
  owner_login: string;
  name: string;
  family: SweepSummary['family'];
  rows_from: number;
  rows_to: number;
  cols_from: number;
  cols_to: number;
  method: SweepSummary['method'];
  time_limit_seconds: number | null;
  visibility: SweepSummary['visibility'];
  created_at: Date;
}

interface CellRunRow {
  id: string;
  rows: number;
  cols: number;
  status: RunStatus;
  rank_number: number | null;
  lower: number | null;
  upper: number | null;
  provenance: string | null;
}

const SWEEP_SELECT = `SELECT s.*, u.login AS owner_login FROM sweeps s JOIN users u ON u.id = s.owner_id`;

function summaryOf(s: SweepRow, counts: SweepCounts): SweepSummary {
  const ranges = { family: s.family, rowsFrom: s.rows_from, rowsTo: s.rows_to, colsFrom: s.cols_from, colsTo: s.cols_to };
  const cells = sweepCells(ranges);
  return {
    id: s.id,
    name: s.name,
    family: s.family,
    rows: { from: s.rows_from, to: s.rows_to },
    cols: { from: s.cols_from, to: s.cols_to },
    method: s.method,
    timeLimitSeconds: s.time_limit_seconds,
    visibility: s.visibility,
    owner: { id: s.owner_id, login: s.owner_login },
    createdAt: new Date(s.created_at).toISOString(),
    cellCount: cells.length,
    runCount: distinctRuns(cells).length,
    mirrorCells: MIRRORED_FAMILIES.has(s.family) ? 'shared' : 'none',
    counts,
  };
}

const emptyCounts = (): SweepCounts => ({ queued: 0, running: 0, done: 0, failed: 0, cancelled: 0 });

async function countsOf(source: DataSource, ids: string[]): Promise<Map<string, SweepCounts>> {
  const rows = await queryRows<{ sweep_id: string; status: RunStatus; n: number }>(
    source,
    `SELECT sweep_id, status, count(*)::int AS n FROM runs WHERE sweep_id = ANY($1::uuid[]) GROUP BY sweep_id, status`,
    [ids],
  );
  const out = new Map(ids.map((id) => [id, emptyCounts()]));
  for (const r of rows) out.get(r.sweep_id)![r.status] = r.n;
  return out;
}

const canSee = (actor: MemberActor, s: SweepRow) => s.owner_id === actor.user.id || s.visibility === 'public' || seesEveryRun(actor);

/** The sweep with its table: every cell (mirror cells show the run of their transpose). */
export async function loadSweepView(source: DataSource, id: string): Promise<SweepView | undefined> {
  const [s] = await queryRows<SweepRow>(source, `${SWEEP_SELECT} WHERE s.id = $1`, [id]);
  if (!s) return undefined;
  const runs = await queryRows<CellRunRow>(
    source,
    `SELECT id, (spec->>'rows')::int AS rows, (spec->>'cols')::int AS cols, status, rank_number, lower, upper, provenance->>'value' AS provenance
     FROM runs WHERE sweep_id = $1`,
    [id],
  );
  const byCell = new Map(runs.map((r) => [`${r.rows}x${r.cols}`, r]));
  const counts = emptyCounts();
  for (const r of runs) counts[r.status]++;
  const cells: SweepCell[] = sweepCells({ family: s.family, rowsFrom: s.rows_from, rowsTo: s.rows_to, colsFrom: s.cols_from, colsTo: s.cols_to }).map((c) => {
    const run = byCell.get(`${c.runRows}x${c.runCols}`);
    const mirrored = c.runRows !== c.rows || c.runCols !== c.cols;
    return {
      rows: c.rows,
      cols: c.cols,
      runId: run?.id ?? null,
      status: run?.status ?? null,
      rankNumber: run?.rank_number ?? null,
      lower: run?.lower ?? null,
      upper: run?.upper ?? null,
      provenance: run?.provenance ?? null,
      mirrorOf: mirrored ? { rows: c.runRows, cols: c.runCols } : null,
      closedForm: closedFormOf(s.family, c.rows, c.cols),
    };
  });
  return { sweep: summaryOf(s, counts), cells };
}

/** GET /api/v1/sweeps/:id: own, public, or any for an admin; a private sweep of someone else is 404. */
export async function findVisibleSweep(source: DataSource, actor: MemberActor, id: string): Promise<SweepView> {
  const [s] = await queryRows<SweepRow>(source, `${SWEEP_SELECT} WHERE s.id = $1`, [id]);
  const view = s && canSee(actor, s) ? await loadSweepView(source, id) : undefined;
  if (!view) throw new HttpError(404, 'not_found', `no sweep ${id}`);
  return view;
}

/** GET /api/v1/sweeps: own and public sweeps (every one for an admin), newest first. */
export async function listSweeps(source: DataSource, actor: MemberActor, q: SweepListQuery): Promise<SweepList> {
  const all = seesEveryRun(actor);
  const rows = await queryRows<SweepRow>(
    source,
    `${SWEEP_SELECT} ${all ? '' : `WHERE s.owner_id = $3 OR s.visibility = 'public'`} ORDER BY s.created_at DESC, s.id DESC LIMIT $1 OFFSET $2`,
    all ? [q.limit + 1, q.offset] : [q.limit + 1, q.offset, actor.user.id],
  );
  const page = rows.slice(0, q.limit);
  const counts = await countsOf(source, page.map((s) => s.id));
  return { sweeps: page.map((s) => summaryOf(s, counts.get(s.id)!)), nextOffset: rows.length > q.limit ? q.offset + q.limit : null };
}

const csvField = (v: string | number | null) => {
  if (v === null) return '';
  const text = String(v);
  return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
};

/** The table as CSV, one row per cell; a mirror cell names the cell it shares its run with. */
export function sweepCsv(view: SweepView): string {
  const lines = ['rows,cols,status,rank_number,lower,upper,provenance,run_id,mirror_of'];
  for (const c of view.cells) {
    lines.push(
      [c.rows, c.cols, c.status, c.rankNumber, c.lower, c.upper, c.provenance, c.runId, c.mirrorOf ? `${c.mirrorOf.rows}x${c.mirrorOf.cols}` : null].map(csvField).join(','),
    );
  }
  return `${lines.join('\n')}\n`;
}
