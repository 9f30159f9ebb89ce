import { z } from 'zod';

/** GET /api/v1/dev/mail (admins, only while the local mail catcher runs): the mail Cairn has sent. */
export const CaughtMailView = z.object({
  id: z.number().int(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  receivedAt: z.string(),
  /** The plain-text body. */
  text: z.string(),
});
export type CaughtMailView = z.infer<typeof CaughtMailView>;

export const CaughtMailList = z.object({ messages: z.array(CaughtMailView) });
export type CaughtMailList = z.infer<typeof CaughtMailList>;
