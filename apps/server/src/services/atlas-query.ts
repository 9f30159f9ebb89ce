import { EngineError, parseGraphSpec } from '@cairn/engine';
import type { AtlasEntryView, AtlasList, AtlasQuery } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import { seesEveryRun, type Actor } from '../auth/actor';
import { HttpError } from '../http/errors';
import { graphKeyOf } from './graph-key';
import { preparedRows } from '../db/prepared-rows';

interface AtlasRow {
  graph_key: string;
  family: string;
  sizes: Record<string, number>;
  vertex_count: number;
  edge_count: number;
  lower: number;
  upper: number;
  exact: boolean;
  lower_provenance: Record<string, unknown>;
  upper_provenance: Record<string, unknown>;
  lower_run_id: string | null;
  upper_run_id: string | null;
  updated_at: Date;
}

function toView(r: AtlasRow): AtlasEntryView {
  return {
    graphKey: r.graph_key,
    family: r.family,
    sizes: r.sizes,
    vertexCount: r.vertex_count,
    edgeCount: r.edge_count,
    lower: r.lower,
    upper: r.upper,
    exact: r.exact,
    rankNumber: r.exact ? r.lower : null,
    lowerProvenance: r.lower_provenance,
    upperProvenance: r.upper_provenance,
    lowerRunId: r.lower_run_id,
    upperRunId: r.upper_run_id,
    updatedAt: new Date(r.updated_at).toISOString(),
  };
}

/** Who reads the atlas: an entry names a run that proved a side only to a reader who may open that run. */
export interface AtlasReader {
  userId: string | null;
  seesEveryRun: boolean;
}

/** The reader of a request (anonymous readers see the ids of public runs only). */
export function atlasReaderOf(actor: Actor): AtlasReader {
  return actor.kind === 'anonymous' ? { userId: null, seesEveryRun: false } : { userId: actor.user.id, seesEveryRun: seesEveryRun(actor) };
}

/**
 * A proving run's id, or null when the reader may not open that run (the rule of canSeeRun: public, the
 * reader's own, or any for an admin): the values are public, the private runs behind them are not, and
 * not even their ids should say that they exist. `user` and `admin` are the reader's parameters.
 */
const visibleRunId = (column: 'lower_run_id' | 'upper_run_id', user: string, admin: string) =>
  `CASE WHEN EXISTS (SELECT 1 FROM runs r WHERE r.id = a.${column} AND (r.visibility = 'public' OR r.owner_id = ${user}::uuid OR ${admin}::boolean))
    THEN a.${column} END AS ${column}`;

const entryColumns = (user: string, admin: string) =>
  `a.graph_key, a.family, a.sizes, a.vertex_count, a.edge_count, a.lower, a.upper, a.exact, a.lower_provenance, a.upper_provenance,
   ${visibleRunId('lower_run_id', user, admin)}, ${visibleRunId('upper_run_id', user, admin)}, a.updated_at`;

/** Families whose key puts the smaller size first (a grid and its transpose are one entry). */
const TRANSPOSABLE = new Set(['grid', 'torus']);

/** GET /api/v1/atlas: filtered by family, sizes (exact or ranges) and exactness; ordered by family and size. */
export async function listAtlas(source: DataSource, q: AtlasQuery, reader: AtlasReader): Promise<AtlasList> {
  const where: string[] = [];
  const params: unknown[] = [];
  const param = (v: unknown) => {
    params.push(v);
    return `$${params.length}`;
  };
  let { rows, cols } = q;
  if (rows !== undefined && cols !== undefined && rows > cols && (q.family === undefined || TRANSPOSABLE.has(q.family))) [rows, cols] = [cols, rows];
  const size = (name: 'rows' | 'cols') => `(sizes->>'${name}')::int`;
  if (q.family) where.push(`family = ${param(q.family)}`);
  if (rows !== undefined) where.push(`${size('rows')} = ${param(rows)}`);
  if (cols !== undefined) where.push(`${size('cols')} = ${param(cols)}`);
  if (q.rowsFrom !== undefined) where.push(`${size('rows')} >= ${param(q.rowsFrom)}`);
  if (q.rowsTo !== undefined) where.push(`${size('rows')} <= ${param(q.rowsTo)}`);
  if (q.colsFrom !== undefined) where.push(`${size('cols')} >= ${param(q.colsFrom)}`);
  if (q.colsTo !== undefined) where.push(`${size('cols')} <= ${param(q.colsTo)}`);
  if (q.exact !== undefined) where.push(`exact = ${param(q.exact)}`);
  const filter = where.length ? `WHERE ${where.join(' AND ')}` : '';
  const countParams = params.slice(); // the filter's values alone, for a page past the end
  // Prepared statements: the texts come from the filter's shape alone (values are parameters), so
  // there are a bounded number of them, and the atlas is the most read page. The page and the count of
  // all matches come in one round trip (a window count); only a page past the end asks for the count alone
  // (an empty first page means nothing matches).
  const rowsFound = await preparedRows<AtlasRow & { total: number }>(
    source,
    `SELECT ${entryColumns(param(reader.userId), param(reader.seesEveryRun))}, count(*) OVER ()::int AS total FROM atlas_entries a ${filter}
     ORDER BY family, ${size('rows')} NULLS LAST, ${size('cols')} NULLS LAST, vertex_count, graph_key
     LIMIT ${param(q.limit)} OFFSET ${param(q.offset)}`,
    params,
  );
  const countAlone = async () => ((await preparedRows<{ total: number }>(source, `SELECT count(*)::int AS total FROM atlas_entries ${filter}`, countParams)) as [{ total: number }])[0].total;
  const total = rowsFound.length > 0 ? rowsFound[0]!.total : q.offset === 0 ? 0 : await countAlone();
  const next = q.offset + rowsFound.length;
  return { entries: rowsFound.map(toView), total, nextOffset: next < total ? next : null };
}

const FIND_ENTRY = `SELECT ${entryColumns('$2', '$3')} FROM atlas_entries a WHERE a.graph_key = ANY($1) LIMIT 1`;

/**
 * GET /api/v1/atlas/:key: by the atlas key, or by any text spec of the same graph (grid:9x4 finds the
 * entry grid:4x9).
 */
export async function findAtlasEntry(source: DataSource, key: string, reader: AtlasReader): Promise<AtlasEntryView> {
  const keys = [key];
  try {
    const spec = parseGraphSpec(key);
    if (spec.family !== 'file' && !((spec.family === 'mask' || spec.family === 'tree') && spec.file !== undefined)) keys.push(graphKeyOf(spec).key);
  } catch (err) {
    if (!(err instanceof EngineError)) throw err;
  }
  const [row] = await preparedRows<AtlasRow>(source, FIND_ENTRY, [keys, reader.userId, reader.seesEveryRun]);
  if (!row) throw new HttpError(404, 'not_found', `the atlas has no entry for ${key}`);
  return toView(row);
}
