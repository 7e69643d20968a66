import { z } from 'zod';
import { CheckInSchema, GatePositionSchema } from './check-in';
import { LocalDateSchema } from './local-date';
import { PlanOverviewSchema } from './plan-overview';
import { DemandSchema, TierSchema } from './piece';

export const SessionItemSchema = z.object({
  kind: z.enum(['gate', 'warm_up', 'play', 'burst', 'rest', 'cool_down']),
  minutes: z.number(),
  startMinute: z.number(),
  block: z.number().int().optional(),
  tier: TierSchema.nullable().optional(),
  gate: z.object({ position: GatePositionSchema, afterBlock: z.number().int().optional() }).optional(),
});
export type SessionItem = z.infer<typeof SessionItemSchema>;

export const DaySessionSchema = z.object({
  index: z.number().int(),
  startTime: z.string(),
  startsAt: z.string(),
  playingMinutes: z.number(),
  items: z.array(SessionItemSchema),
  /** Whether a check-in was already saved for this session today. */
  done: z.boolean(),
});
export type DaySession = z.infer<typeof DaySessionSchema>;

export const ClearedPieceSchema = z.object({
  id: z.string(),
  title: z.string(),
  composer: z.string(),
  tier: TierSchema,
  passages: z.array(z.object({ bars: z.string(), demands: z.array(DemandSchema), cleared: z.boolean() })),
});
export type ClearedPiece = z.infer<typeof ClearedPieceSchema>;

export const SetupReminderSchema = z.object({ id: z.string(), label: z.string(), instructions: z.string() });
export type SetupReminder = z.infer<typeof SetupReminderSchema>;

/** Everything the musician's Today screen needs. */
export const TodaySchema = z.object({
  date: LocalDateSchema,
  kind: z.enum(['before_start', 'rest', 'playing', 'taper', 'event', 'stopped', 'ended']),
  notes: z.array(z.string()),
  overview: PlanOverviewSchema,
  sessions: z.array(DaySessionSchema),
  pieces: z.array(ClearedPieceSchema),
  setup: z.array(SetupReminderSchema),
  painThreshold: z.object({ session: z.number().int(), nextMorning: z.number().int() }),
  maxBurstMinutes: z.number(),
  /** The playing day the next-morning question is about, when it is still unanswered. */
  morningCheckFor: LocalDateSchema.nullable(),
});
export type Today = z.infer<typeof TodaySchema>;

/** A check-in as the musician's device sends it; `clientKey` makes a retried upload count once. */
export const CheckInUploadSchema = z.object({
  clientKey: z.string().trim().min(8).max(100),
  checkIn: CheckInSchema,
});
export type CheckInUpload = z.infer<typeof CheckInUploadSchema>;

/** What the server answers after a check-in: the plan as it now stands and what happened. */
export const CheckInResultSchema = z.object({
  id: z.string(),
  duplicate: z.boolean(),
  overview: PlanOverviewSchema,
  /** True when this check-in ended today's playing (a gate over the threshold) or stopped it (red flag). */
  stopPlaying: z.boolean(),
  redFlag: z.boolean(),
  clinicianNotified: z.boolean(),
  /** The engine's explanation of the change this check-in caused, if any. */
  change: z.string().nullable(),
});
export type CheckInResult = z.infer<typeof CheckInResultSchema>;
