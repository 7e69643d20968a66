import { z } from 'zod';
import { PersonNameSchema } from './auth';
import { GateAnswerSchema, RedFlagSchema } from './check-in';
import { InstrumentSchema } from './invitation';
import { LocalDateSchema } from './local-date';

/** Side of the presenting problem; midline for neck and back. */
export const ProblemSideSchema = z.enum(['left', 'right', 'both', 'midline']);
export type ProblemSide = z.infer<typeof ProblemSideSchema>;

/** The presenting problem, for the clinician only: never shown to a teacher or sent by e-mail. */
export const PresentingProblemSchema = z.object({
  region: z.string().nullable(),
  side: ProblemSideSchema.nullable(),
  onset: z.string().nullable(),
  summary: z.string().nullable(),
});
export type PresentingProblem = z.infer<typeof PresentingProblemSchema>;

export const MusicianProfileSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  instrument: z.string(),
  joined: z.boolean(),
  createdAt: z.string(),
  problem: PresentingProblemSchema,
});
export type MusicianProfile = z.infer<typeof MusicianProfileSchema>;

/** Free text that may be cleared: an empty string is stored as "not given". */
const clearable = (max: number, what: string) =>
  z
    .string()
    .trim()
    .max(max, { error: `Keep ${what} under ${max} characters.` })
    .transform((value) => (value === '' ? null : value))
    .nullable()
    .optional();

/** PATCH body: only the fields sent change. The e-mail is the account's and is not edited here. */
export const UpdateMusicianProfileSchema = z
  .object({
    name: PersonNameSchema.optional(),
    instrument: InstrumentSchema.optional(),
    problem: z
      .object({
        region: clearable(80, 'the region'),
        side: ProblemSideSchema.nullable().optional(),
        onset: clearable(120, 'the onset'),
        summary: clearable(2000, 'the summary'),
      })
      .optional(),
  })
  .refine((body) => Object.values(body).some((value) => value !== undefined), { error: 'Change at least one field.' });
export type UpdateMusicianProfile = z.infer<typeof UpdateMusicianProfileSchema>;

/** A private clinical note: the clinician's only. */
export const ClinicalNoteSchema = z.object({
  id: z.string(),
  body: z.string(),
  authorName: z.string(),
  createdAt: z.string(),
});
export type ClinicalNote = z.infer<typeof ClinicalNoteSchema>;

export const CreateClinicalNoteSchema = z.object({
  body: z
    .string({ error: 'Write the note.' })
    .trim()
    .min(1, { error: 'Write the note.' })
    .max(5000, { error: 'Keep a note under 5000 characters.' }),
});
export type CreateClinicalNote = z.infer<typeof CreateClinicalNoteSchema>;

/** One row of the check-in history table, newest first. */
export const CheckInRowSchema = z.object({
  id: z.string(),
  date: LocalDateSchema,
  kind: z.enum(['session', 'next_morning', 'pain_report']),
  sessionIndex: z.number().int().nullable(),
  minutesPlayed: z.number().nullable(),
  effort: z.number().nullable(),
  /** Highest pain reported (gates of a session, or the morning's pain). */
  highestPain: z.number().int(),
  overThreshold: z.boolean(),
  gates: z.array(GateAnswerSchema),
  redFlags: z.array(RedFlagSchema),
  note: z.string().nullable(),
  recordedAt: z.string(),
});
export type CheckInRow = z.infer<typeof CheckInRowSchema>;
