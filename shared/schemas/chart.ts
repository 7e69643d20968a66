import { z } from 'zod';
import { LocalDateSchema } from './local-date';

/** One day of the planned-against-played chart. */
export const ChartDaySchema = z.object({
  date: LocalDateSchema,
  kind: z.enum(['before_start', 'rest', 'playing', 'taper', 'event', 'stopped']),
  /** 1-based stage planned that day (null before the start or while stopped). */
  stageNumber: z.number().int().nullable(),
  plannedMinutes: z.number(),
  /** Minutes reported; null for days still to come. */
  playedMinutes: z.number().nullable(),
  /** Highest pain during the day (gates, pain reports), and the pain reported that morning (null: none reported). */
  sessionPain: z.number().int().nullable(),
  morningPain: z.number().int().nullable(),
  overThreshold: z.boolean(),
  redFlag: z.boolean(),
});
export type ChartDay = z.infer<typeof ChartDaySchema>;

export const ChartStageSchema = z.object({
  stageNumber: z.number().int(),
  startDate: LocalDateSchema,
  endDate: LocalDateSchema,
  minutesPerDay: z.number(),
  kind: z.enum(['actual', 'projected']),
});

/** Planned (the engine's sessions on the current progression) against played minutes, to the event. */
export const PlayingChartSchema = z.object({
  today: LocalDateSchema,
  startDate: LocalDateSchema,
  event: z.object({ name: z.string(), date: LocalDateSchema }),
  painThreshold: z.object({ session: z.number().int(), nextMorning: z.number().int() }),
  days: z.array(ChartDaySchema),
  stages: z.array(ChartStageSchema),
});
export type PlayingChart = z.infer<typeof PlayingChartSchema>;

const RatioSchema = z.object({ acute: z.number(), chronic: z.number(), ratio: z.number() });

/**
 * Playing load: session load = CR-10 effort x minutes (Foster et al. 2001); 7/28-day ratios (Hulin et
 * al. 2014) and EWMA (Williams et al. 2017); the warning is a soft prompt (Gabbett 2016).
 */
export const LoadSummarySchema = z.object({
  today: LocalDateSchema,
  days: z.array(
    z.object({ date: LocalDateSchema, minutes: z.number(), load: z.number(), sessionsWithoutEffort: z.number().int() }),
  ),
  rolling: RatioSchema.nullable(),
  rollingUncoupled: RatioSchema.nullable(),
  ewma: RatioSchema.nullable(),
  warning: z.object({
    level: z.enum(['none', 'above_range', 'well_above_range']),
    ratio: z.number().nullable(),
    message: z.string().nullable(),
  }),
});
export type LoadSummary = z.infer<typeof LoadSummarySchema>;
