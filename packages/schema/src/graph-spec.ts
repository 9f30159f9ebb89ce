import { z } from 'zod';

/** The most vertices a graph may have; the engine enforces the same limit (MAX_VERTICES). */
export const MAX_GRAPH_VERTICES = 10_000_000;
const MAX_MASK_TEXT = 20_000_000;

const size = (name: string, min = 1) =>
  z
    .number({ error: `${name} must be a number` })
    .int(`${name} must be a whole number`)
    .min(min, `${name} must be at least ${min}`)
    .max(MAX_GRAPH_VERTICES, `${name} is more than a graph may hold`);

const rowsCols = (family: 'grid' | 'cylinder' | 'torus', minRows: number, minCols: number) =>
  z
    .object({ family: z.literal(family), rows: size('rows', minRows), cols: size('cols', minCols) })
    .refine((s) => s.rows * s.cols <= MAX_GRAPH_VERTICES, { message: `rows x cols is more than the ${MAX_GRAPH_VERTICES} vertices a graph may have`, path: ['cols'] });

/**
 * The JSON form of a graph spec, as the API and saved runs carry it. It mirrors the engine's text form
 * (`grid:4x7` is `{ "family": "grid", "rows": 4, "cols": 7 }`); masks and trees come inline, and an
 * uploaded graph is named by its id.
 */
export const GraphSpec = z.discriminatedUnion('family', [
  rowsCols('grid', 1, 1),
  rowsCols('cylinder', 1, 3),
  rowsCols('torus', 3, 3),
  z.object({ family: z.literal('staircase'), t: size('t').max(4471, 't is more than a graph may hold') }),
  z.object({ family: z.literal('path'), n: size('n') }),
  z.object({ family: z.literal('cycle'), n: size('n', 3) }),
  z.object({ family: z.literal('complete'), n: size('n').max(14142, 'n is more than a graph may hold (edges)') }),
  z
    .object({ family: z.literal('bipartite'), a: size('a'), b: size('b') })
    .refine((s) => s.a * s.b <= 100_000_000, { message: 'a x b is more edges than a graph may hold', path: ['b'] }),
  z.object({ family: z.literal('star'), leaves: size('leaves').max(MAX_GRAPH_VERTICES - 1) }),
  z.object({ family: z.literal('random-tree'), n: size('n'), seed: z.number().int().min(0).max(2 ** 32 - 1).default(1) }),
  z.object({
    family: z.literal('gnp'),
    n: size('n'),
    p: z.number().min(0, 'p must be a probability in [0, 1]').max(1, 'p must be a probability in [0, 1]'),
    seed: z.number().int().min(0).max(2 ** 32 - 1).default(1),
  }),
  z.object({
    family: z.literal('mask'),
    text: z.string().min(1, 'the mask text is empty').max(MAX_MASK_TEXT).regex(/^[#.\s]*$/, "a mask is written with '#' for a cell and '.' for a hole"),
  }),
  z.object({ family: z.literal('tree'), parents: z.array(z.number().int().min(-1)).min(1).max(MAX_GRAPH_VERTICES) }),
  z.object({ family: z.literal('upload'), graphId: z.uuid() }),
]);
export type GraphSpec = z.infer<typeof GraphSpec>;
