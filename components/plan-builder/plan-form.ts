import { z } from 'zod';
import { FixedLevelSchema, PlanSettingsSchema, type PlanSettings, type PlanSettingsInput } from '@/shared/schemas/plan-settings';

/** A number typed into a text field; the shared settings schema then checks its range. */
const typed = z
  .string({ error: 'Enter a number.' })
  .trim()
  .min(1, { error: 'Enter a number.' })
  .regex(/^\d+(\.\d+)?$/, { error: 'Digits only, for example 10.' })
  .transform(Number);

const timeList = z
  .string()
  .transform((text) => text.split(',').map((part) => part.trim()).filter((part) => part.length > 0));

/**
 * The builder's form: the plan settings with numbers as typed text, piped into the shared
 * `PlanSettingsSchema`. Field names match the settings, so the engine's messages and the server's 422
 * issues (`settings.<field>`) land beside the same fields.
 */
const PlanFormObject = z.object({
  startDate: z.string(),
  timeZone: z.string(),
  event: z.object({ name: z.string(), date: z.string() }),
  startMinutesPerDay: typed,
  targetMinutesPerDay: typed,
  maxSessionsPerDay: typed,
  maxSessionMinutes: typed,
  sessionTimes: timeList,
  startBlockMinutes: typed,
  startRestMinutes: typed,
  targetBlockMinutes: typed,
  targetRestMinutes: typed,
  warmUpMinutes: typed,
  coolDownMinutes: typed,
  restDaysPerWeek: typed,
  restWeekdays: z.array(z.number().int()),
  minDaysPerStage: typed,
  maxDaysPerStage: typed,
  stepMinutes: typed,
  maxStageGrowthPercent: typed,
  maxWeeklyGrowthPercent: typed,
  painThreshold: z.object({ session: typed, nextMorning: typed }),
  failuresBeforeStepBack: typed,
  requireNextMorningCheck: z.boolean(),
  tierUnlockStage: z.object({ easy: typed, moderate: typed, demanding: typed }),
  passagesUnlockStage: typed,
  maxBurstMinutes: typed,
  easyBetweenBurstsMinutes: typed,
  taperDays: typed,
  taperPercent: typed,
  fixedLevels: z.array(FixedLevelSchema),
});

export const PlanFormSchema = PlanFormObject.transform(({ restWeekdays, ...rest }): PlanSettingsInput =>
  // No weekdays picked: the engine spreads the rest days evenly.
  restWeekdays.length > 0 ? { ...rest, restWeekdays: [...restWeekdays].sort((a, b) => a - b) } : rest,
).pipe(PlanSettingsSchema);

export type PlanFormValues = z.input<typeof PlanFormSchema>;
export type PlanFormField = Exclude<keyof PlanFormValues, 'event' | 'painThreshold' | 'tierUnlockStage'> | 'event.name' | 'event.date' | 'painThreshold.session' | 'painThreshold.nextMorning' | 'tierUnlockStage.easy' | 'tierUnlockStage.moderate' | 'tierUnlockStage.demanding';

/** Settings (parsed, with defaults) as the form shows them. */
export function toFormValues(s: PlanSettings): PlanFormValues {
  const text = (n: number) => String(n);
  return {
    startDate: s.startDate,
    timeZone: s.timeZone,
    event: { name: s.event.name, date: s.event.date },
    startMinutesPerDay: text(s.startMinutesPerDay),
    targetMinutesPerDay: text(s.targetMinutesPerDay),
    maxSessionsPerDay: text(s.maxSessionsPerDay),
    maxSessionMinutes: text(s.maxSessionMinutes),
    sessionTimes: s.sessionTimes.join(', '),
    startBlockMinutes: text(s.startBlockMinutes),
    startRestMinutes: text(s.startRestMinutes),
    targetBlockMinutes: text(s.targetBlockMinutes),
    targetRestMinutes: text(s.targetRestMinutes),
    warmUpMinutes: text(s.warmUpMinutes),
    coolDownMinutes: text(s.coolDownMinutes),
    restDaysPerWeek: text(s.restDaysPerWeek),
    restWeekdays: s.restWeekdays ?? [],
    minDaysPerStage: text(s.minDaysPerStage),
    maxDaysPerStage: text(s.maxDaysPerStage),
    stepMinutes: text(s.stepMinutes),
    maxStageGrowthPercent: text(s.maxStageGrowthPercent),
    maxWeeklyGrowthPercent: text(s.maxWeeklyGrowthPercent),
    painThreshold: { session: text(s.painThreshold.session), nextMorning: text(s.painThreshold.nextMorning) },
    failuresBeforeStepBack: text(s.failuresBeforeStepBack),
    requireNextMorningCheck: s.requireNextMorningCheck,
    tierUnlockStage: { easy: text(s.tierUnlockStage.easy), moderate: text(s.tierUnlockStage.moderate), demanding: text(s.tierUnlockStage.demanding) },
    passagesUnlockStage: text(s.passagesUnlockStage),
    maxBurstMinutes: text(s.maxBurstMinutes),
    easyBetweenBurstsMinutes: text(s.easyBetweenBurstsMinutes),
    taperDays: text(s.taperDays),
    taperPercent: text(s.taperPercent),
    fixedLevels: s.fixedLevels,
  };
}

/** Every field an issue can be shown beside (issues on fixed levels go above the form). */
export const PLAN_FORM_FIELDS: readonly PlanFormField[] = [
  'startDate', 'timeZone', 'event.name', 'event.date', 'startMinutesPerDay', 'targetMinutesPerDay', 'maxSessionsPerDay',
  'maxSessionMinutes', 'sessionTimes', 'startBlockMinutes', 'startRestMinutes', 'targetBlockMinutes', 'targetRestMinutes',
  'warmUpMinutes', 'coolDownMinutes', 'restDaysPerWeek', 'restWeekdays', 'minDaysPerStage', 'maxDaysPerStage', 'stepMinutes',
  'maxStageGrowthPercent', 'maxWeeklyGrowthPercent', 'painThreshold.session', 'painThreshold.nextMorning',
  'failuresBeforeStepBack', 'requireNextMorningCheck', 'tierUnlockStage.easy', 'tierUnlockStage.moderate',
  'tierUnlockStage.demanding', 'passagesUnlockStage', 'maxBurstMinutes', 'easyBetweenBurstsMinutes', 'taperDays', 'taperPercent',
];

/** The field a settings issue belongs to: the server prefixes `settings.`; a whole object maps to its first field. */
export function fieldOfIssue(path: string): PlanFormField | null {
  const bare = path.replace(/^settings\./, '');
  const exact = PLAN_FORM_FIELDS.find((field) => field === bare);
  if (exact) return exact;
  if (bare === 'event') return 'event.name';
  if (bare === 'tierUnlockStage') return 'tierUnlockStage.moderate';
  if (bare === 'painThreshold') return 'painThreshold.session';
  return null;
}
