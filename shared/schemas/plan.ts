import { z } from 'zod';
import { LocalDateSchema } from './local-date';
import { OverrideActionSchema } from './override';
import { PieceSchema, TierSchema } from './piece';
import { PlanOverviewSchema } from './plan-overview';
import { PlanSettingsSchema } from './plan-settings';

/** A plan version: drafts are edited freely; activating one supersedes the active version. */
export const PlanVersionStatusSchema = z.enum(['draft', 'active', 'superseded']);
export type PlanVersionStatus = z.infer<typeof PlanVersionStatusSchema>;

export const PlanVersionSchema = z.object({
  id: z.string(),
  version: z.number().int(),
  status: PlanVersionStatusSchema,
  settings: PlanSettingsSchema,
  createdBy: z.string(),
  createdAt: z.string(),
  activatedAt: z.string().nullable(),
});
export type PlanVersion = z.infer<typeof PlanVersionSchema>;

/**
 * Body of "create a draft", "edit a version" and "preview": the settings as the clinician gives them;
 * everything but the start date and the event falls back to the engine's defaults. 422 issues name
 * fields as `settings.<field>`.
 */
export const PlanSettingsBodySchema = z.object({ settings: PlanSettingsSchema });
export type PlanSettingsBody = z.infer<typeof PlanSettingsBodySchema>;
export type PlanSettingsBodyInput = z.input<typeof PlanSettingsBodySchema>;

/** What a stage allows: the same fields wherever a stage is shown. */
export const StageLevelSchema = z.object({
  minutesPerDay: z.number(),
  sessionsPerDay: z.number().int(),
  blockMinutes: z.number(),
  restMinutes: z.number(),
  highestTier: TierSchema.nullable(),
  passagesCleared: z.boolean(),
  /** "published": a level copied from a published table; "rule": Ritorno's own progression rule. */
  basis: z.enum(['published', 'rule']),
});

/** One stage of the plan as built: a level of the ladder placed on the calendar. */
export const StageSchema = StageLevelSchema.extend({
  index: z.number().int(),
  number: z.number().int(),
  source: z.string(),
  startDate: LocalDateSchema,
  endDate: LocalDateSchema,
});
export type StageView = z.infer<typeof StageSchema>;

const StoredPieceSchema = PieceSchema.extend({ id: z.string().optional() });

/** Whether the target load and the programme are reached before the event, and the options if not. */
export const FeasibilitySchema = z.object({
  feasible: z.boolean(),
  eventDate: LocalDateSchema,
  readyBy: LocalDateSchema,
  targetMinutesPerDay: z.number(),
  targetReachedOn: LocalDateSchema,
  programmeClearedOn: LocalDateSchema.nullable(),
  daysShort: z.number().int(),
  minutesReachable: z.number(),
  tierReachable: TierSchema.nullable(),
  reducedProgramme: z.object({
    ready: z.array(StoredPieceSchema),
    withoutPassages: z.array(StoredPieceSchema),
    notReady: z.array(StoredPieceSchema),
  }),
  earliestFeasibleEventDate: LocalDateSchema,
  message: z.string(),
});
export type FeasibilityView = z.infer<typeof FeasibilitySchema>;

/** Stages and feasibility for some settings and the musician's repertoire (nothing is saved). */
export const PlanPreviewSchema = z.object({
  settings: PlanSettingsSchema,
  stages: z.array(StageSchema),
  feasibility: FeasibilitySchema,
});
export type PlanPreview = z.infer<typeof PlanPreviewSchema>;

/** A version with its stages and feasibility. */
export const PlanVersionDetailSchema = PlanVersionSchema.extend({ preview: PlanPreviewSchema });
export type PlanVersionDetail = z.infer<typeof PlanVersionDetailSchema>;

/** Starting points for the plan builder: the engine's defaults and named presets. */
export const PlanPresetsSchema = z.object({
  /** Every default but the start date and the event, which the clinician always gives. */
  defaults: z.record(z.string(), z.unknown()),
  presets: z.array(
    z.object({ id: z.string(), label: z.string(), description: z.string(), values: z.record(z.string(), z.unknown()) }),
  ),
});
export type PlanPresets = z.infer<typeof PlanPresetsSchema>;

/** The result of activating a draft. */
export const ActivatedPlanSchema = PlanVersionSchema.extend({
  supersededId: z.string().nullable(),
  emailSent: z.boolean(),
});
export type ActivatedPlan = z.infer<typeof ActivatedPlanSchema>;

/** A clinician's override of the progression; `date` defaults to today in the plan's time zone. */
export const OverrideRequestSchema = z.object({
  action: OverrideActionSchema,
  reason: z
    .string({ error: 'Give a reason.' })
    .trim()
    .min(1, { error: 'Give a reason.' })
    .max(1000, { error: 'Keep the reason under 1000 characters.' }),
  date: LocalDateSchema.optional(),
});
export type OverrideRequest = z.infer<typeof OverrideRequestSchema>;

export const OverrideRecordSchema = z.object({
  id: z.string(),
  action: OverrideActionSchema,
  date: LocalDateSchema,
  reason: z.string(),
  by: z.string(),
  at: z.string(),
});
export type OverrideRecord = z.infer<typeof OverrideRecordSchema>;

export const HistoryEventSchema = z.object({
  date: LocalDateSchema,
  kind: z.enum([
    'advanced', 'held', 'stepped_back', 'stopped', 'red_flag_cleared',
    'clinician_hold', 'clinician_resume', 'clinician_advance', 'clinician_step_back', 'over_time', 'short_day',
  ]),
  fromStage: z.number().int(),
  toStage: z.number().int(),
  message: z.string(),
  by: z.string().optional(),
});
export type HistoryEventView = z.infer<typeof HistoryEventSchema>;

/** The active plan as it stands: overview, stage periods (played and expected), explained history. */
export const PlanStateSchema = z.object({
  plan: PlanVersionSchema,
  overview: PlanOverviewSchema,
  cleanDays: z.number().int(),
  periods: z.array(
    z.object({ stageIndex: z.number().int(), startDate: LocalDateSchema, endDate: LocalDateSchema, kind: z.enum(['actual', 'projected']) }),
  ),
  feasibility: FeasibilitySchema,
  history: z.array(HistoryEventSchema),
  prompts: z.array(z.string()),
  overrides: z.array(OverrideRecordSchema),
});
export type PlanState = z.infer<typeof PlanStateSchema>;

export const OverrideResultSchema = z.object({ override: OverrideRecordSchema, state: PlanStateSchema });
export type OverrideResult = z.infer<typeof OverrideResultSchema>;
