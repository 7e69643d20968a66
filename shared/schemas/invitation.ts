import { z } from 'zod';
import { EmailSchema, PasswordSchema, PersonNameSchema } from './auth';

export const InstrumentSchema = z
  .string({ error: 'Enter the instrument.' })
  .trim()
  .min(1, { error: 'Enter the instrument.' })
  .max(60, { error: 'Keep the instrument under 60 characters.' });

/** A clinician invites a musician (who joins their caseload) or a teacher. */
export const CreateInvitationSchema = z.discriminatedUnion('role', [
  z.object({ role: z.literal('musician'), name: PersonNameSchema, email: EmailSchema, instrument: InstrumentSchema }),
  z.object({ role: z.literal('teacher'), name: PersonNameSchema, email: EmailSchema }),
]);
export type CreateInvitation = z.infer<typeof CreateInvitationSchema>;

export const InvitationStatusSchema = z.enum(['pending', 'accepted', 'expired']);
export type InvitationStatus = z.infer<typeof InvitationStatusSchema>;

export const InvitationSchema = z.object({
  id: z.string(),
  role: z.enum(['musician', 'teacher']),
  name: z.string(),
  email: z.string(),
  status: InvitationStatusSchema,
  expiresAt: z.string(),
  createdAt: z.string(),
});
export type Invitation = z.infer<typeof InvitationSchema>;

/** What the acceptance screen shows before the person sets a password. */
export const InvitationPreviewSchema = z.object({
  role: z.enum(['musician', 'teacher']),
  name: z.string(),
  email: z.string(),
  invitedBy: z.string(),
  expiresAt: z.string(),
});
export type InvitationPreview = z.infer<typeof InvitationPreviewSchema>;

export const AcceptInvitationSchema = z.object({ password: PasswordSchema });
export type AcceptInvitation = z.infer<typeof AcceptInvitationSchema>;
