import { z } from 'zod';

/**
 * GET /api/v1/runs/:id/plan: what a finished run's certificate ranking says as a schedule. The
 * elimination forest (parent of each vertex, -1 at a root), the step plan (step s handles every vertex
 * labelled s; the vertices of one step run in parallel) and an elimination ordering (lowest labels first).
 */
export const RunPlan = z.object({
  runId: z.uuid(),
  vertexCount: z.number().int().min(0),
  forestParents: z.array(z.number().int().min(-1)),
  steps: z.array(z.object({ step: z.number().int().min(1), vertices: z.array(z.number().int().min(0)), count: z.number().int().min(0) })),
  order: z.array(z.number().int().min(0)),
});
export type RunPlan = z.infer<typeof RunPlan>;
