import { rankingSvg, rankingTikz } from '@cairn/engine';
import type { RunExportFormat } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import { HttpError } from '../http/errors';
import { buildGraph, engineInputOf } from './run-engine-input';
import type { RunRow } from './run-row';
import { specTextOf } from './run-spec';
import { solveResultOf, toRunView } from './run-view';

/** Grid-like graphs are drawn cell by cell up to this many cells; others as nodes and edges up to this many vertices. */
export const MAX_DRAWN_CELLS = 40_000;
export const MAX_DRAWN_VERTICES = 100;

export interface RunExport {
  contentType: string;
  fileName: string;
  body: string;
}

const EXTENSIONS: Record<RunExportFormat, string> = { json: 'json', csv: 'csv', svg: 'svg', tikz: 'tex' };
const TYPES: Record<RunExportFormat, string> = {
  json: 'application/json; charset=utf-8',
  csv: 'text/csv; charset=utf-8',
  svg: 'image/svg+xml; charset=utf-8',
  tikz: 'application/x-tex; charset=utf-8',
};

/** A file name that says what is in it: `cairn-grid-4x9-1a2b3c4d.svg`. */
export function exportFileName(row: RunRow, format: RunExportFormat): string {
  const what = specTextOf(row.spec).replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'run';
  return `cairn-${what}-${row.id.slice(0, 8)}.${EXTENSIONS[format]}`;
}

/**
 * A run's result as a file: `json` the run with its SolveResult, `csv` one `vertex,label` row per
 * vertex (the certificate), `svg` and `tikz` the ranking drawn by the engine. 409 while there is no
 * result; 400 for a drawing of a graph too large or not grid-like enough to draw legibly.
 */
export async function exportRun(source: DataSource, row: RunRow, format: RunExportFormat, publicUrl: string): Promise<RunExport> {
  const result = solveResultOf(row);
  if (!result) throw new HttpError(409, 'no_result', `the run is ${row.status} and has no result to export yet`);
  const out = (body: string): RunExport => ({ contentType: TYPES[format], fileName: exportFileName(row, format), body });
  if (format === 'json') return out(`${JSON.stringify(toRunView(row, publicUrl), null, 2)}\n`);
  if (format === 'csv') return out(`vertex,label\n${result.labels.map((l, v) => `${v},${l}`).join('\n')}\n`);
  const input = await engineInputOf(source, row.spec);
  if (!input) throw new HttpError(409, 'graph_missing', 'the uploaded graph of this run no longer exists, so it cannot be drawn');
  const graph = buildGraph(input);
  const gridLike = graph.layout !== undefined;
  if (gridLike ? graph.layout!.rows * graph.layout!.cols > MAX_DRAWN_CELLS : graph.vertexCount > MAX_DRAWN_VERTICES) {
    throw new HttpError(
      400,
      'invalid_request',
      `query.format: ${format} draws grid-like graphs (grids, masks, staircases, cylinders, tori) of at most ${MAX_DRAWN_CELLS} cells, or other graphs of at most ${MAX_DRAWN_VERTICES} vertices; ${specTextOf(row.spec)} is ${gridLike ? `${graph.layout!.rows} x ${graph.layout!.cols} cells` : `${graph.vertexCount} vertices and not grid-like`}. Export csv or json instead`,
      { problems: [{ field: 'query.format', message: 'this graph cannot be drawn legibly' }] },
    );
  }
  return out(format === 'svg' ? rankingSvg(graph, result.labels) : rankingTikz(graph, result.labels));
}
