import { z } from 'zod';

/** What "send my weekly summary now" answers. `week` is the ISO week, e.g. 2027-W09. */
export const SummarySentSchema = z.object({
  sent: z.boolean(),
  week: z.string(),
  musicianCount: z.number().int(),
  to: z.string(),
});
export type SummarySent = z.infer<typeof SummarySentSchema>;
