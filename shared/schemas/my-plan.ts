import { z } from 'zod';
import { LocalDateSchema } from './local-date';
import { StageLevelSchema } from './plan';
import { PlanOverviewSchema } from './plan-overview';
import { DemandSchema, TierSchema } from './piece';
import { SetupReminderSchema } from './today';

/** One stage on the calendar: as played ("actual") or as now expected ("projected"). */
export const MyPlanStageSchema = StageLevelSchema.extend({
  stageNumber: z.number().int(),
  startDate: LocalDateSchema,
  endDate: LocalDateSchema,
  kind: z.enum(['actual', 'projected']),
  /** The period the musician is in today. */
  current: z.boolean(),
});
export type MyPlanStage = z.infer<typeof MyPlanStageSchema>;

/** The next stage that clears something new, and when it is expected if the checks stay clear. */
export const NextUnlockSchema = z.object({
  stageNumber: z.number().int(),
  expectedOn: LocalDateSchema.nullable(),
  /** A tier newly allowed at that stage (null: none). */
  tier: TierSchema.nullable(),
  /** Demanding passages become playable at that stage. */
  passages: z.boolean(),
  /** Titles of the pieces that stage clears. */
  pieces: z.array(z.string()),
});
export type NextUnlock = z.infer<typeof NextUnlockSchema>;

export const MyPieceSchema = z.object({
  id: z.string(),
  title: z.string(),
  composer: z.string(),
  tier: TierSchema,
  onProgramme: z.boolean(),
  cleared: z.boolean(),
  /** When it is expected to be cleared (null when cleared already, or while playing is stopped). */
  expectedOn: LocalDateSchema.nullable(),
  passages: z.array(
    z.object({ bars: z.string(), demands: z.array(DemandSchema), cleared: z.boolean(), expectedOn: LocalDateSchema.nullable() }),
  ),
});
export type MyPiece = z.infer<typeof MyPieceSchema>;

/** The musician's own plan (GET /api/plan): stages to the event, where they stand, what comes next. */
export const MyPlanSchema = z.object({
  overview: PlanOverviewSchema,
  stages: z.array(MyPlanStageSchema),
  /** Playing days passed without symptoms at the current stage, and how many a stage needs. */
  cleanDays: z.number().int(),
  minDaysPerStage: z.number().int(),
  nextUnlock: NextUnlockSchema.nullable(),
  event: z.object({ name: z.string(), date: LocalDateSchema }),
  pieces: z.array(MyPieceSchema),
  setup: z.array(SetupReminderSchema),
  /** The plan's explained changes, newest first. */
  changes: z.array(z.object({ date: LocalDateSchema, message: z.string() })),
});
export type MyPlan = z.infer<typeof MyPlanSchema>;
