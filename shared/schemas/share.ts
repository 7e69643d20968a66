import { z } from 'zod';
import { EmailSchema, PersonNameSchema } from './auth';

/** A musician shares their clearance (never medical detail) with a teacher or ensemble director. */
export const CreateShareSchema = z.object({ name: PersonNameSchema, email: EmailSchema });
export type CreateShare = z.infer<typeof CreateShareSchema>;

export const ShareSchema = z.object({
  teacherId: z.string().nullable(),
  name: z.string(),
  email: z.string(),
  /** "active" once the teacher has an account; "invited" while the e-mailed invitation is open. */
  status: z.enum(['active', 'invited']),
  since: z.string(),
});
export type Share = z.infer<typeof ShareSchema>;
