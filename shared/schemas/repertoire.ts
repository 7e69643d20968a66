import { z } from 'zod';
import { LocalDateSchema } from './local-date';
import { PassageSchema, PieceSchema, TierSchema } from './piece';

/** Body of "add a piece": title, composer, tier, demanding passages, on the event's programme. */
export const CreatePieceSchema = PieceSchema.omit({ id: true });
export type CreatePiece = z.infer<typeof CreatePieceSchema>;

/** PATCH body: only the fields sent change (no defaults here, so nothing is reset by omission). */
export const UpdatePieceSchema = z
  .object({
    title: z.string().trim().min(1, 'Give the title').optional(),
    composer: z.string().trim().optional(),
    tier: TierSchema.optional(),
    passages: z.array(PassageSchema).optional(),
    onProgramme: z.boolean().optional(),
  })
  .refine((body) => Object.values(body).some((value) => value !== undefined), { error: 'Change at least one field.' });
export type UpdatePiece = z.infer<typeof UpdatePieceSchema>;

/** Derived from the active plan's state each time; null while there is no active plan. */
export const PieceClearanceSchema = z.object({
  clearedFromStage: z.number().int(),
  passagesFromStage: z.number().int().nullable(),
  cleared: z.boolean(),
  passagesCleared: z.boolean(),
  expectedOn: LocalDateSchema.nullable(),
  passagesExpectedOn: LocalDateSchema.nullable(),
});
export type PieceClearance = z.infer<typeof PieceClearanceSchema>;

export const PieceRecordSchema = z.object({
  id: z.string(),
  title: z.string(),
  composer: z.string(),
  tier: TierSchema,
  passages: z.array(PassageSchema),
  onProgramme: z.boolean(),
  createdAt: z.string(),
  clearance: PieceClearanceSchema.nullable(),
});
export type PieceRecord = z.infer<typeof PieceRecordSchema>;
