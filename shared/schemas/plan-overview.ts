import { z } from 'zod';
import { LocalDateSchema } from './local-date';
import { TierSchema } from './piece';

/** Where a musician stands in their plan (names for our own states, in the trade's words). */
export const ProgressionStatusSchema = z.enum(['on_track', 'held', 'stepped_back', 'stopped', 'complete']);
export type ProgressionStatusName = z.infer<typeof ProgressionStatusSchema>;

/**
 * A plan at a glance for the musician and their clinician (never for a teacher: `lastChange`
 * explains pain and red flags).
 */
export const PlanOverviewSchema = z.object({
  planId: z.string(),
  version: z.number().int(),
  today: LocalDateSchema,
  status: ProgressionStatusSchema,
  stageNumber: z.number().int(),
  stageCount: z.number().int(),
  minutesPerDay: z.number(),
  sessionsPerDay: z.number().int(),
  longestBlockMinutes: z.number(),
  restMinutes: z.number(),
  highestTier: TierSchema.nullable(),
  nextStageStartDate: LocalDateSchema.nullable(),
  event: z.object({ name: z.string(), date: LocalDateSchema }),
  daysToEvent: z.number().int(),
  feasible: z.boolean(),
  targetReachedOn: LocalDateSchema,
  daysShort: z.number().int(),
  redFlagActive: z.boolean(),
  lastChange: z.string().nullable(),
});
export type PlanOverview = z.infer<typeof PlanOverviewSchema>;
