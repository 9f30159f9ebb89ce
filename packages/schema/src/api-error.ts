import { z } from 'zod';

/** Every error the API answers with: a machine-readable code, a sentence for people, and details. */
export const ApiError = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
});
export type ApiError = z.infer<typeof ApiError>;
