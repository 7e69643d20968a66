import { z } from 'zod';
import { LocalDateSchema } from './local-date';
import { DemandSchema, TierSchema } from './piece';

/**
 * Readiness in plain words for a teacher. Deliberately vague: "delayed" covers a hold, a step back and
 * a plan that cannot reach the event, so a teacher never learns why.
 */
export const ReadinessSchema = z.enum(['on_track', 'delayed', 'paused']);
export type Readiness = z.infer<typeof ReadinessSchema>;

export const ClearedPassageSchema = z.object({
  bars: z.string(),
  demands: z.array(DemandSchema),
  cleared: z.boolean(),
  expectedOn: LocalDateSchema.nullable(),
});

export const PieceClearanceViewSchema = z.object({
  title: z.string(),
  composer: z.string(),
  tier: TierSchema,
  onProgramme: z.boolean(),
  cleared: z.boolean(),
  /** When the piece is expected to be cleared, if not yet (a projection, not a promise). */
  expectedOn: LocalDateSchema.nullable(),
  passages: z.array(ClearedPassageSchema),
});
export type PieceClearanceView = z.infer<typeof PieceClearanceViewSchema>;

/** What a teacher may know about a student: what to play and how much, never why. */
export const StudentClearanceSchema = z.object({
  id: z.string(),
  name: z.string(),
  instrument: z.string(),
  asOf: LocalDateSchema,
  readiness: ReadinessSchema,
  event: z.object({ name: z.string(), date: LocalDateSchema }).nullable(),
  limits: z.object({
    minutesPerDay: z.number(),
    longestBlockMinutes: z.number(),
    restMinutes: z.number(),
    sessionsPerDay: z.number().int(),
  }),
  pieces: z.array(PieceClearanceViewSchema),
  programme: z.object({ total: z.number().int(), cleared: z.number().int(), fullyCleared: z.number().int() }),
});
export type StudentClearance = z.infer<typeof StudentClearanceSchema>;

export const StudentSummarySchema = StudentClearanceSchema.pick({
  id: true,
  name: true,
  instrument: true,
  readiness: true,
  event: true,
  asOf: true,
});
export type StudentSummary = z.infer<typeof StudentSummarySchema>;
