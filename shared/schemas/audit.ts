import { z } from 'zod';

/** One line of the audit trail: who did what to whose record, and when. */
export const AuditEntrySchema = z.object({
  id: z.string(),
  at: z.string(),
  actorName: z.string().nullable(),
  action: z.string(),
  musicianId: z.string().nullable(),
  musicianName: z.string().nullable(),
  detail: z.record(z.string(), z.unknown()),
});
export type AuditEntry = z.infer<typeof AuditEntrySchema>;
