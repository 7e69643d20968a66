import { z } from 'zod';

/** A message caught by the local fake SMTP server (development mailbox). */
export const DevMailSchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  receivedAt: z.string(),
});
export type DevMail = z.infer<typeof DevMailSchema>;
