import { z } from 'zod';

/** The answer of GET /api/health: the server is up, and whether its database answered a real query. */
export const HealthResponse = z.object({
  status: z.enum(['ok', 'degraded']),
  db: z.enum(['ok', 'down']),
  /** Why the database is counted as down; absent when it answered. */
  reason: z.string().optional(),
  version: z.string(),
});
export type HealthResponse = z.infer<typeof HealthResponse>;
