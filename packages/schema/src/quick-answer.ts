import { z } from 'zod';

/** GET /api/v1/quick?spec=grid:4x9 — what Cairn can say at once, without queueing a run. */
export const QuickQuery = z.strictObject({ spec: z.string().min(1, 'give a spec such as grid:4x9').max(200) });
export type QuickQuery = z.infer<typeof QuickQuery>;

/**
 * The fastest answer: the atlas's entry when there is one, else a closed form, else the constructions'
 * upper bound and the best lower bound computed on the spot (for graphs small enough to do so at once).
 */
export const QuickAnswer = z.object({
  spec: z.string(),
  graphKey: z.string(),
  vertexCount: z.number().int().min(0),
  edgeCount: z.number().int().min(0),
  lower: z.number().int().min(0),
  upper: z.number().int().min(0),
  rankNumber: z.number().int().min(0).nullable(),
  source: z.enum(['atlas', 'formula', 'bounds']),
  /** In words: how each side is known. */
  lowerArgument: z.string(),
  upperArgument: z.string(),
  /** The runs that proved the atlas's sides, when the answer came from the atlas. */
  lowerRunId: z.uuid().nullable(),
  upperRunId: z.uuid().nullable(),
});
export type QuickAnswer = z.infer<typeof QuickAnswer>;
