import { z } from 'zod';

/** How to reach a value: a closed form, exact search, constructions and lower bounds, or Cairn's choice. */
export const SolveMethod = z.enum(['auto', 'exact', 'bounds', 'formula']);
export type SolveMethod = z.infer<typeof SolveMethod>;

/**
 * What solve returns, as the CLI prints it with --json and the server stores it with a run. `rankNumber`
 * is null unless proven (lower = upper); `labels` is the certificate: a ranking with `upper` labels, one
 * per vertex in the engine's vertex numbering, checked by the verifier (`verified`).
 */
export const SolveResult = z.object({
  graph: z.object({
    vertexCount: z.number().int().min(0),
    edgeCount: z.number().int().min(0),
    family: z.record(z.string(), z.unknown()).nullable(),
  }),
  rankNumber: z.number().int().min(0).nullable(),
  lower: z.number().int().min(0),
  upper: z.number().int().min(0),
  labels: z.array(z.number().int().min(1)),
  provenance: z.object({
    /** 'exact-search', 'formula:<id>' or 'bound'. */
    value: z.string(),
    lower: z.object({ argument: z.string(), source: z.string() }),
    upper: z.object({ construction: z.string(), argument: z.string() }),
  }),
  /** What proves the lower side, checkable against the graph (a path, a clique, a rectangle, ...). */
  witness: z.record(z.string(), z.unknown()).nullable(),
  verified: z.boolean(),
  stats: z.object({
    method: SolveMethod,
    elapsedMs: z.number().min(0),
    nodes: z.number().int().min(0),
    memoSize: z.number().int().min(0),
    stopReason: z.enum(['aborted', 'time-limit', 'memory-limit']).nullable(),
  }),
});
export type SolveResult = z.infer<typeof SolveResult>;
