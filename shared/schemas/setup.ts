import { z } from 'zod';

/** Kinds of playing-setup modification a clinician prescribes; `custom` for anything else. */
export const SETUP_KINDS = ['seat_wedge', 'chin_rest', 'shoulder_rest', 'thumb_rest', 'strap', 'stand_height', 'custom'] as const;
export const SetupKindSchema = z.enum(SETUP_KINDS);
export type SetupKind = z.infer<typeof SetupKindSchema>;

const label = z
  .string({ error: 'Name the modification.' })
  .trim()
  .min(1, { error: 'Name the modification.' })
  .max(120, { error: 'Keep the name under 120 characters.' });
const instructions = z.string().trim().max(1000, { error: 'Keep the instructions under 1000 characters.' });

export const SetupItemSchema = z.object({
  id: z.string(),
  kind: SetupKindSchema,
  label: z.string(),
  instructions: z.string(),
  /** Only active items are shown to the musician as reminders. */
  active: z.boolean(),
  createdAt: z.string(),
});
export type SetupItem = z.infer<typeof SetupItemSchema>;

export const CreateSetupItemSchema = z.object({
  kind: SetupKindSchema,
  label,
  instructions: instructions.default(''),
  active: z.boolean().default(true),
});
export type CreateSetupItem = z.infer<typeof CreateSetupItemSchema>;

export const UpdateSetupItemSchema = z
  .object({ kind: SetupKindSchema.optional(), label: label.optional(), instructions: instructions.optional(), active: z.boolean().optional() })
  .refine((body) => Object.values(body).some((value) => value !== undefined), { error: 'Change at least one field.' });
export type UpdateSetupItem = z.infer<typeof UpdateSetupItemSchema>;
