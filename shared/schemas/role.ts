import { z } from 'zod';

/** One account, one role. Clinicians sign up; musicians and teachers are invited by a clinician. */
export const RoleSchema = z.enum(['clinician', 'musician', 'teacher', 'admin']);
export type Role = z.infer<typeof RoleSchema>;

export const ROLES = RoleSchema.options;

export const MeSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: RoleSchema,
});
export type Me = z.infer<typeof MeSchema>;
