import { z } from 'zod';
import { RunStatus, Visibility } from './access';
import { GraphSpec } from './graph-spec';
import { SolveMethod, SolveResult } from './solve-result';

/** The longest a run may search, in seconds (an hour); longer work belongs to the CLI on one's own machine. */
export const MAX_RUN_SECONDS = 3600;
/** The time limit of a run that names none, in seconds. */
export const DEFAULT_RUN_SECONDS = 60;
/** The most cells one sweep may fan out into. */
export const MAX_SWEEP_CELLS = 400;

const timeLimitSeconds = z
  .number({ error: 'timeLimitSeconds must be a number of seconds' })
  .int('timeLimitSeconds must be a whole number of seconds')
  .min(1, 'timeLimitSeconds must be at least 1')
  .max(MAX_RUN_SECONDS, `timeLimitSeconds may be at most ${MAX_RUN_SECONDS} (an hour)`);

/** A graph as a run request names it: the text form (`grid:4x9`) or the JSON form of a spec. */
export const RunSpecInput = z.union([z.string().min(1, 'the spec is empty').max(200, 'a text spec is at most 200 characters'), GraphSpec], {
  error: 'expected a text spec such as "grid:4x9" or a spec object such as { "family": "grid", "rows": 4, "cols": 9 }',
});
export type RunSpecInput = z.infer<typeof RunSpecInput>;

/**
 * POST /api/v1/runs: one graph, by spec or by the id of an upload (exactly one of the two). The server
 * reads no files: specs that name a file (`mask:FILE`, `tree:FILE`, a path) are refused; upload it instead.
 */
export const RunRequest = z
  .strictObject({
    spec: RunSpecInput.optional(),
    graphId: z.uuid('graphId must be the id of an uploaded graph').optional(),
    method: SolveMethod.default('auto'),
    timeLimitSeconds: timeLimitSeconds.default(DEFAULT_RUN_SECONDS),
    visibility: Visibility.optional(),
  })
  .superRefine((r, ctx) => {
    if ((r.spec === undefined) === (r.graphId === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['spec'], message: 'give exactly one of spec (e.g. "grid:4x9") or graphId (an uploaded graph)' });
    }
  });
export type RunRequest = z.infer<typeof RunRequest>;

/** The newest progress report of a search. */
export const RunProgress = z.object({
  nodes: z.number().int().min(0),
  lower: z.number().int().min(0),
  upper: z.number().int().min(0),
  elapsedMs: z.number().min(0),
  memoSize: z.number().int().min(0).optional(),
});
export type RunProgress = z.infer<typeof RunProgress>;

export const RunOwner = z.object({ id: z.uuid(), login: z.string() });
export type RunOwner = z.infer<typeof RunOwner>;

export const RunFailure = z.object({ code: z.string(), message: z.string() });
export type RunFailure = z.infer<typeof RunFailure>;

/** Where to find a run and what to do with it; API paths are relative to the server, `web` is absolute. */
export const RunLinks = z.object({
  self: z.string(),
  events: z.string(),
  cancel: z.string(),
  export: z.string(),
  web: z.string(),
  /** The share link (anyone holding it may read the run); null unless the run is shared by link or public with a token. */
  shared: z.string().nullable(),
});
export type RunLinks = z.infer<typeof RunLinks>;

/** A run as lists show it: everything but the certificate. */
export const RunSummary = z.object({
  id: z.uuid(),
  status: RunStatus,
  /** The spec in JSON form (an upload is `{ family: 'upload', graphId }`). */
  spec: z.record(z.string(), z.unknown()),
  /** The spec as people write it (`grid:4x9`; inline masks and trees by their size). */
  specText: z.string(),
  /** The atlas key: the same graph has the same key (`grid:4x9` for grid:9x4 too). */
  graphKey: z.string(),
  family: z.string(),
  method: SolveMethod,
  timeLimitSeconds: z.number().int().nullable(),
  visibility: Visibility,
  progress: RunProgress.nullable(),
  rankNumber: z.number().int().nullable(),
  lower: z.number().int().nullable(),
  upper: z.number().int().nullable(),
  /** How the value is known (`exact-search`, `formula:<id>`, `bound`); null until there is a result. */
  provenance: z.string().nullable(),
  error: RunFailure.nullable(),
  owner: RunOwner,
  sweepId: z.uuid().nullable(),
  /** How many times a worker started it (more than 1 after a worker stopped or died mid-run). */
  attempts: z.number().int().min(0),
  cancelRequested: z.boolean(),
  createdAt: z.iso.datetime(),
  startedAt: z.iso.datetime().nullable(),
  finishedAt: z.iso.datetime().nullable(),
  links: RunLinks,
});
export type RunSummary = z.infer<typeof RunSummary>;

/**
 * One run. `result` is the engine's SolveResult (the same document as `cairn solve --json`) once the
 * server has re-verified its certificate; a cancelled run keeps the best interval it reached.
 */
export const RunView = RunSummary.extend({ result: SolveResult.nullable() });
export type RunView = z.infer<typeof RunView>;

const listLimit = z.coerce.number().int('limit must be a whole number').min(1, 'limit must be at least 1').max(100, 'limit may be at most 100').default(25);
const offset = z.coerce.number().int('offset must be a whole number').min(0, 'offset must be at least 0').max(1_000_000);

/** GET /api/v1/runs */
export const RunListQuery = z.strictObject({
  limit: listLimit,
  /** The `nextCursor` of the previous page. */
  cursor: z.string().min(1).max(200).optional(),
  offset: offset.optional(),
  status: RunStatus.optional(),
  family: z.string().min(1).max(40).optional(),
  /** A member's login, or `me`. */
  owner: z.string().min(1).max(100).optional(),
  sweepId: z.uuid().optional(),
});
export type RunListQuery = z.infer<typeof RunListQuery>;

export const RunList = z.object({
  runs: z.array(RunSummary),
  /** Pass as `cursor` for the next page; null on the last page. */
  nextCursor: z.string().nullable(),
});
export type RunList = z.infer<typeof RunList>;

/** PATCH /api/v1/runs/:id */
export const RunVisibilityRequest = z.strictObject({ visibility: Visibility });
export type RunVisibilityRequest = z.infer<typeof RunVisibilityRequest>;

/** POST /api/v1/runs/:id/share */
export const RunShareRequest = z.strictObject({ email: z.email('email must be an e-mail address') });
export type RunShareRequest = z.infer<typeof RunShareRequest>;

export const RunShareResponse = z.object({
  run: RunView,
  /** The link that was mailed (the web app's page of the shared run). */
  url: z.string(),
  /** Whether the mail went out; the run is shared by link either way. */
  mailed: z.boolean(),
});
export type RunShareResponse = z.infer<typeof RunShareResponse>;

export const RunExportFormat = z.enum(['json', 'csv', 'svg', 'tikz']);
export type RunExportFormat = z.infer<typeof RunExportFormat>;

/** GET /api/v1/runs/:id/export */
export const RunExportQuery = z.strictObject({ format: RunExportFormat.default('json') });
export type RunExportQuery = z.infer<typeof RunExportQuery>;

/** The `data` of a `progress` event on GET /api/v1/runs/:id/events. */
export const RunProgressEvent = RunProgress.extend({ status: RunStatus });
export type RunProgressEvent = z.infer<typeof RunProgressEvent>;

/**
 * The events GET /api/v1/runs/:id/events sends: `status` when the run starts, `progress` when the search
 * reports, then one of `done`, `failed`, `cancelled` with the run (RunView), or `deleted`; then the stream ends.
 */
export const RunEventName = z.enum(['status', 'progress', 'done', 'failed', 'cancelled', 'deleted']);
export type RunEventName = z.infer<typeof RunEventName>;

export const SweepFamily = z.enum(['grid', 'cylinder', 'torus']);
export type SweepFamily = z.infer<typeof SweepFamily>;

const sizeRange = (name: string) =>
  z
    .strictObject({
      from: z.number({ error: `${name}.from must be a number` }).int(`${name}.from must be a whole number`).min(1, `${name}.from must be at least 1`).max(1000, `${name}.from may be at most 1000`),
      to: z.number({ error: `${name}.to must be a number` }).int(`${name}.to must be a whole number`).min(1, `${name}.to must be at least 1`).max(1000, `${name}.to may be at most 1000`),
    })
    .refine((r) => r.from <= r.to, { message: `${name}.from must not exceed ${name}.to`, path: ['to'] });

/**
 * POST /api/v1/sweeps: one run per (rows, cols) cell of the ranges. Grids and tori are the same graph
 * transposed, so a cell with rows > cols shares the run of its mirror cell (rows and cols swapped)
 * instead of computing it again; cylinders (rows are paths, columns close into cycles) are not symmetric.
 */
export const SweepRequest = z.strictObject({
  name: z.string().trim().min(1, 'name is empty').max(120, 'name is at most 120 characters').optional(),
  family: SweepFamily,
  rows: sizeRange('rows'),
  cols: sizeRange('cols'),
  method: SolveMethod.default('auto'),
  timeLimitSeconds: timeLimitSeconds.default(DEFAULT_RUN_SECONDS),
  visibility: Visibility.optional(),
});
export type SweepRequest = z.infer<typeof SweepRequest>;

export const SweepCounts = z.object({
  queued: z.number().int(),
  running: z.number().int(),
  done: z.number().int(),
  failed: z.number().int(),
  cancelled: z.number().int(),
});
export type SweepCounts = z.infer<typeof SweepCounts>;

export const SweepSummary = z.object({
  id: z.uuid(),
  name: z.string(),
  family: SweepFamily,
  rows: z.object({ from: z.number().int(), to: z.number().int() }),
  cols: z.object({ from: z.number().int(), to: z.number().int() }),
  method: SolveMethod,
  timeLimitSeconds: z.number().int().nullable(),
  visibility: Visibility,
  owner: RunOwner,
  createdAt: z.iso.datetime(),
  /** Cells of the table (rows x cols) and the distinct runs behind them. */
  cellCount: z.number().int(),
  runCount: z.number().int(),
  /** How mirror cells are treated: `shared` (rows > cols show the run of cols x rows) or `none`. */
  mirrorCells: z.enum(['shared', 'none']),
  counts: SweepCounts,
});
export type SweepSummary = z.infer<typeof SweepSummary>;

/** One cell of a sweep's table; `mirrorOf` names the cell whose run it shows (a transposed grid or torus). */
export const SweepCell = z.object({
  rows: z.number().int(),
  cols: z.number().int(),
  runId: z.uuid().nullable(),
  status: RunStatus.nullable(),
  rankNumber: z.number().int().nullable(),
  lower: z.number().int().nullable(),
  upper: z.number().int().nullable(),
  provenance: z.string().nullable(),
  mirrorOf: z.object({ rows: z.number().int(), cols: z.number().int() }).nullable(),
  /** The cell's value by a closed form with a source, whatever its run says (for the chart's formula curve). */
  closedForm: z.object({ value: z.number().int(), id: z.string() }).nullable(),
});
export type SweepCell = z.infer<typeof SweepCell>;

export const SweepView = z.object({ sweep: SweepSummary, cells: z.array(SweepCell) });
export type SweepView = z.infer<typeof SweepView>;

/** GET /api/v1/sweeps */
export const SweepListQuery = z.strictObject({ limit: listLimit, offset: offset.default(0) });
export type SweepListQuery = z.infer<typeof SweepListQuery>;

export const SweepList = z.object({ sweeps: z.array(SweepSummary), nextOffset: z.number().int().nullable() });
export type SweepList = z.infer<typeof SweepList>;

/** GET /api/v1/sweeps/:id/export */
export const SweepExportQuery = z.strictObject({ format: z.enum(['csv']).default('csv') });
export type SweepExportQuery = z.infer<typeof SweepExportQuery>;

/** One row of the atlas: the best Cairn knows of one graph, each side with its argument and run. */
export const AtlasEntryView = z.object({
  graphKey: z.string(),
  family: z.string(),
  sizes: z.record(z.string(), z.number()),
  vertexCount: z.number().int(),
  edgeCount: z.number().int(),
  lower: z.number().int(),
  upper: z.number().int(),
  exact: z.boolean(),
  rankNumber: z.number().int().nullable(),
  lowerProvenance: z.record(z.string(), z.unknown()),
  upperProvenance: z.record(z.string(), z.unknown()),
  /** The runs that proved each side; null when the reader may not open that run (or it was deleted). */
  lowerRunId: z.uuid().nullable(),
  upperRunId: z.uuid().nullable(),
  updatedAt: z.iso.datetime(),
});
export type AtlasEntryView = z.infer<typeof AtlasEntryView>;

const size = (name: string) => z.coerce.number().int(`${name} must be a whole number`).min(1, `${name} must be at least 1`).max(10_000_000);

/**
 * GET /api/v1/atlas. Sizes are the atlas's canonical ones: for grids and tori rows <= cols (a query for
 * rows 9, cols 4 finds grid:4x9).
 */
export const AtlasQuery = z.strictObject({
  family: z.string().min(1).max(40).optional(),
  rows: size('rows').optional(),
  cols: size('cols').optional(),
  rowsFrom: size('rowsFrom').optional(),
  rowsTo: size('rowsTo').optional(),
  colsFrom: size('colsFrom').optional(),
  colsTo: size('colsTo').optional(),
  exact: z.enum(['true', 'false'], { error: 'exact must be true or false' }).transform((v) => v === 'true').optional(),
  limit: listLimit,
  offset: offset.default(0),
});
export type AtlasQuery = z.infer<typeof AtlasQuery>;

export const AtlasList = z.object({ entries: z.array(AtlasEntryView), total: z.number().int(), nextOffset: z.number().int().nullable() });
export type AtlasList = z.infer<typeof AtlasList>;

/** GET /api/v1/runs/:id and friends: the id in the path. */
export const RunIdParams = z.object({ id: z.uuid('the run id must be a UUID') });
export const SweepIdParams = z.object({ id: z.uuid('the sweep id must be a UUID') });
export const AtlasKeyParams = z.object({ key: z.string().min(1).max(300) });
export const ShareTokenParams = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{16,64}$/, 'not a share token') });
