import { z } from 'zod';
import { LocalDateSchema, LocalTimeSchema, TimeZoneSchema } from './local-date';
import { TierSchema } from './piece';

export { TierSchema, type Tier } from './piece';

const minutes = (min: number, max: number) => z.number().int().min(min).max(max);

/** A level fixed by a published table rather than by our progression rule. */
export const FixedLevelSchema = z.object({
  minutesPerDay: minutes(1, 600),
  blockMinutes: minutes(1, 120),
  restMinutes: minutes(0, 240),
  /** Where the row comes from, shown beside the stage. */
  source: z.string().min(1),
});
export type FixedLevel = z.infer<typeof FixedLevelSchema>;

/** Pain 0-10 at or below which a gate passes. The default 0 follows BAPAM's "no pain" rule. */
const threshold = z.number().int().min(0).max(10);

const PlanSettingsObject = z.object({
  startDate: LocalDateSchema,
  timeZone: TimeZoneSchema.default('Europe/London'),
  event: z.object({ name: z.string().trim().min(1, 'Name the event'), date: LocalDateSchema }),

  /** Tolerated playing minutes per day now (BAPAM level 1: 10). */
  startMinutesPerDay: minutes(1, 600).default(10),
  targetMinutesPerDay: minutes(1, 600).default(90),
  maxSessionsPerDay: minutes(1, 4).default(3),
  /** Playing minutes in one session before another session of the day is added. */
  maxSessionMinutes: minutes(5, 240).default(60),
  /** Local start time of each session of a day. */
  sessionTimes: z.array(LocalTimeSchema).min(1).default(['10:00', '14:00', '17:00', '19:30']),

  /** Longest continuous block and rest between blocks now (BAPAM level 1: play 5, rest 60). */
  startBlockMinutes: minutes(1, 120).default(5),
  startRestMinutes: minutes(0, 240).default(60),
  /** At the target: a 5-minute pause after 25 minutes of playing (Klickstein 2009, p. 75). */
  targetBlockMinutes: minutes(1, 120).default(25),
  targetRestMinutes: minutes(0, 240).default(5),
  warmUpMinutes: minutes(0, 30).default(5),
  coolDownMinutes: minutes(0, 30).default(5),

  /** One day a week off (Horvath, Playing (Less) Hurt). */
  restDaysPerWeek: minutes(0, 3).default(1),
  /** ISO weekdays (1 = Monday ... 7 = Sunday); chosen evenly when left out. */
  restWeekdays: z.array(z.number().int().min(1).max(7)).optional(),

  /** Playing days at a stage before moving up: 3 to 7 (BAPAM). */
  minDaysPerStage: minutes(1, 28).default(3),
  maxDaysPerStage: minutes(1, 56).default(7),
  /** Minutes per day added from one stage to the next. */
  stepMinutes: minutes(1, 120).default(10),
  /** Caps on growth of planned minutes per day; the clinician sets them (Buist et al. 2008). */
  maxStageGrowthPercent: z.number().min(1).max(200).default(100),
  maxWeeklyGrowthPercent: z.number().min(1).max(400).default(100),

  painThreshold: z
    .object({ session: threshold.default(0), nextMorning: threshold.default(0) })
    .default({ session: 0, nextMorning: 0 }),
  /** Failed days at one stage before stepping back; 1 = back at once (BAPAM). */
  failuresBeforeStepBack: minutes(1, 5).default(1),
  /** A day counts only once the next morning is also free of symptoms. */
  requireNextMorningCheck: z.boolean().default(true),

  /** 1-based stage at which each tier is cleared. */
  tierUnlockStage: z
    .object({
      easy: minutes(1, 40).default(1),
      moderate: minutes(1, 40).default(4),
      demanding: minutes(1, 40).default(7),
    })
    .default({ easy: 1, moderate: 4, demanding: 7 }),
  /** Stage from which demanding passages of cleared pieces may be played, in bursts. */
  passagesUnlockStage: minutes(1, 40).default(5),
  /** Longest burst of a demanding passage (common practice, no published source). */
  maxBurstMinutes: minutes(1, 10).default(2),
  easyBetweenBurstsMinutes: minutes(1, 20).default(5),

  /** Lighter days before the event, plus the event day itself (Horvath). */
  taperDays: minutes(0, 7).default(1),
  taperPercent: z.number().int().min(10).max(100).default(50),

  /** Leading levels copied from a published table; our rule continues after them. */
  fixedLevels: z.array(FixedLevelSchema).default([]),
});

type Raw = z.infer<typeof PlanSettingsObject>;

function check(s: Raw, ctx: z.RefinementCtx): void {
  const issue = (path: (string | number)[], message: string) =>
    ctx.addIssue({ code: 'custom', path, message });
  if (s.event.date <= s.startDate) issue(['event', 'date'], 'The event must come after the start date');
  if (s.targetMinutesPerDay < s.startMinutesPerDay)
    issue(['targetMinutesPerDay'], 'The target cannot be below the minutes tolerated now');
  if (s.targetMinutesPerDay > s.maxSessionsPerDay * s.maxSessionMinutes)
    issue(['targetMinutesPerDay'], 'The target needs more sessions or longer sessions per day');
  if (s.sessionTimes.length < s.maxSessionsPerDay)
    issue(['sessionTimes'], 'Give a start time for every session of the day');
  if ([...s.sessionTimes].sort().join() !== s.sessionTimes.join())
    issue(['sessionTimes'], 'Session times must be in order');
  if (s.minDaysPerStage > s.maxDaysPerStage)
    issue(['maxDaysPerStage'], 'The longest stay at a stage cannot be shorter than the shortest');
  // At least 10 minutes of rest per hour of playing (Klickstein 2009, p. 75): rest >= block / 5.
  if (s.startRestMinutes * 5 < s.startBlockMinutes)
    issue(['startRestMinutes'], 'Rest at least 1 minute for every 5 minutes played');
  if (s.targetRestMinutes * 5 < s.targetBlockMinutes)
    issue(['targetRestMinutes'], 'Rest at least 1 minute for every 5 minutes played');
  const cap = Math.min(s.maxStageGrowthPercent, s.maxWeeklyGrowthPercent);
  if (Math.floor((s.startMinutesPerDay * cap) / 100) < 1 && s.targetMinutesPerDay > s.startMinutesPerDay)
    issue(['maxStageGrowthPercent'], 'The growth caps are too small to add a single minute');
  const t = s.tierUnlockStage;
  if (!(t.easy <= t.moderate && t.moderate <= t.demanding))
    issue(['tierUnlockStage'], 'Tiers unlock in order: easy, then moderate, then demanding');
  if (s.restWeekdays) {
    if (s.restWeekdays.length !== s.restDaysPerWeek)
      issue(['restWeekdays'], 'Pick as many rest weekdays as rest days per week');
    if (new Set(s.restWeekdays).size !== s.restWeekdays.length)
      issue(['restWeekdays'], 'Rest weekdays must differ');
  }
  checkFixedLevels(s, issue);
}

function checkFixedLevels(s: Raw, issue: (path: (string | number)[], m: string) => void): void {
  const levels = s.fixedLevels;
  const first = levels[0];
  if (!first) return;
  if (first.minutesPerDay !== s.startMinutesPerDay)
    issue(['fixedLevels', 0], 'The first fixed level must match the minutes tolerated now');
  levels.forEach((level, i) => {
    if (level.minutesPerDay > s.targetMinutesPerDay)
      issue(['fixedLevels', i], 'A fixed level cannot exceed the target');
    if (level.restMinutes * 5 < level.blockMinutes)
      issue(['fixedLevels', i], 'Rest at least 1 minute for every 5 minutes played');
    const prev = levels[i - 1];
    if (!prev) return;
    const cap = Math.min(s.maxStageGrowthPercent, s.maxWeeklyGrowthPercent);
    if (level.minutesPerDay <= prev.minutesPerDay)
      issue(['fixedLevels', i], 'Fixed levels must grow');
    else if (level.minutesPerDay > prev.minutesPerDay * (1 + cap / 100))
      issue(['fixedLevels', i], 'A fixed level grows faster than the caps allow');
  });
}

/** Everything a clinician sets for one plan; every field but the start and the event has a default. */
export const PlanSettingsSchema = PlanSettingsObject.superRefine(check);
export type PlanSettings = z.infer<typeof PlanSettingsSchema>;
export type PlanSettingsInput = z.input<typeof PlanSettingsSchema>;
