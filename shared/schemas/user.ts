import { z } from 'zod';
import { RoleSchema } from './role';

/** An account as an admin sees it. */
export const UserSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: RoleSchema,
  createdAt: z.string(),
});
export type UserSummary = z.infer<typeof UserSummarySchema>;
