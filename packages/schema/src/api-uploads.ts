import { z } from 'zod';
import { GraphSpec, MAX_GRAPH_VERTICES } from './graph-spec';

/** The engine's graph file readers; an upload names one, or the server detects it from name and content. */
export const UploadFormat = z.enum(['edge-list', 'dimacs', 'matrix-market', 'json', 'mask']);
export type UploadFormat = z.infer<typeof UploadFormat>;

/** The text fields of an upload (multipart/form-data), beside the file itself. */
export const UploadFields = z.object({
  /** Shown in lists and used in error messages; the file's own name when absent. */
  name: z.string().trim().min(1, 'name must not be empty').max(200, 'name is longer than 200 characters').optional(),
  format: UploadFormat.optional(),
});
export type UploadFields = z.infer<typeof UploadFields>;

/** The whole multipart form of POST /api/v1/graphs, as the API documentation shows it. */
export const UploadForm = UploadFields.extend({
  file: z.file().describe('the graph file: an edge list, DIMACS (p edge / p tw), Matrix Market, Cairn JSON or a mask'),
});

/** Something the reader dropped rather than refused (a self-loop, a repeated edge), with where it is written. */
export const ReadWarningView = z.object({
  kind: z.enum(['self-loop', 'duplicate-edge']),
  line: z.number().int().min(1),
  column: z.number().int().min(1),
  message: z.string(),
});
export type ReadWarningView = z.infer<typeof ReadWarningView>;

/** An uploaded graph as the API shows it (without its content, which has a route of its own). */
export const StoredGraphView = z.object({
  id: z.uuid(),
  name: z.string(),
  format: UploadFormat,
  /** SHA-256 of the uploaded bytes, hex. */
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  vertexCount: z.number().int().min(0),
  edgeCount: z.number().int().min(0),
  sizeBytes: z.number().int().min(0),
  owner: z.object({ id: z.uuid(), login: z.string() }),
  createdAt: z.iso.datetime(),
});
export type StoredGraphView = z.infer<typeof StoredGraphView>;

/** The answer to an upload: the stored graph (a new one, or the same bytes stored before) and what was dropped. */
export const UploadResult = z.object({
  graph: StoredGraphView,
  /** False when the same owner had already uploaded the same bytes: that record is returned. */
  created: z.boolean(),
  /** The first warnings of the reader, in file order. */
  warnings: z.array(ReadWarningView),
  /** Every warning, listed or not. */
  warningCount: z.number().int().min(0),
});
export type UploadResult = z.infer<typeof UploadResult>;

export const StoredGraphParams = z.object({ id: z.uuid('id must be a graph id (a UUID)') });

export const StoredGraphListQuery = z.object({
  limit: z.coerce.number().int().min(1).max(100).default(20),
  offset: z.coerce.number().int().min(0).default(0),
});
export type StoredGraphListQuery = z.infer<typeof StoredGraphListQuery>;

export const StoredGraphList = z.object({
  items: z.array(StoredGraphView),
  total: z.number().int().min(0),
  limit: z.number().int(),
  offset: z.number().int(),
});
export type StoredGraphList = z.infer<typeof StoredGraphList>;

/**
 * POST /api/v1/verify: is `labels` a ranking of the graph? The graph is a spec (text such as `grid:4x9`, or
 * its JSON form) or an uploaded graph; labels[v] is the label of vertex v in the engine's numbering.
 */
export const VerifyRequest = z
  .object({
    spec: z
      .union([z.string().min(1, 'the spec is empty'), GraphSpec], {
        error: 'spec must be a text spec such as "grid:4x9" or a JSON graph spec such as {"family": "grid", "rows": 4, "cols": 9}',
      })
      .optional(),
    graphId: z.uuid('graphId must be a graph id (a UUID)').optional(),
    labels: z.array(z.number(), { error: 'labels must be an array of numbers, one per vertex' }).max(MAX_GRAPH_VERTICES),
  })
  .refine((r) => (r.spec === undefined) !== (r.graphId === undefined), { message: 'send either spec or graphId (exactly one)', path: ['spec'] });
export type VerifyRequest = z.infer<typeof VerifyRequest>;

/** Two vertices with the same label joined by a path whose inner labels are all smaller. */
export const RankingViolationView = z.object({
  label: z.number().int(),
  u: z.number().int().min(0),
  v: z.number().int().min(0),
  /** From u to v, both ends included. */
  path: z.array(z.number().int().min(0)),
  message: z.string(),
});

export const VerifyResponse = z.discriminatedUnion('valid', [
  z.object({
    valid: z.literal(true),
    /** How many different labels the ranking uses. */
    labelCount: z.number().int().min(0),
    maxLabel: z.number().int().min(0),
    vertexCount: z.number().int().min(0),
  }),
  z.object({
    valid: z.literal(false),
    labelCount: z.number().int().min(0),
    maxLabel: z.number().int().min(0),
    vertexCount: z.number().int().min(0),
    violation: RankingViolationView,
  }),
]);
export type VerifyResponse = z.infer<typeof VerifyResponse>;
