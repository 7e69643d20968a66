import {
  PlanSettingsSchema,
  type PlanSettings,
  type PlanSettingsInput,
} from '../schemas/plan-settings';

export type PlanSettingsPreset = {
  id: string;
  label: string;
  description: string;
  values: Partial<PlanSettingsInput>;
};

export const BAPAM_SOURCE =
  'BAPAM, "Returning to Playing and Performance for Instrumental Musicians", return-to-play schedule';

/**
 * "Published levels": levels 1 and 2 exactly as the BAPAM return-to-play schedule gives them
 * (level 1: play 5, rest 60, play 5; level 2: play 10, rest 50, play 10; 3 to 7 days a level).
 * Later stages are not from that table: they follow Ritorno's own rule (step, caps, interpolated
 * blocks and rests) and are labelled as such on each stage.
 */
export const publishedLevelsPreset: PlanSettingsPreset = {
  id: 'published-levels',
  label: 'Published levels',
  description:
    'Levels 1-2 from the BAPAM return-to-play schedule; later stages follow our own progression rule.',
  values: {
    startMinutesPerDay: 10,
    startBlockMinutes: 5,
    startRestMinutes: 60,
    minDaysPerStage: 3,
    maxDaysPerStage: 7,
    maxStageGrowthPercent: 100,
    maxWeeklyGrowthPercent: 100,
    painThreshold: { session: 0, nextMorning: 0 },
    failuresBeforeStepBack: 1,
    fixedLevels: [
      { minutesPerDay: 10, blockMinutes: 5, restMinutes: 60, source: `${BAPAM_SOURCE}, level 1` },
      { minutesPerDay: 20, blockMinutes: 10, restMinutes: 50, source: `${BAPAM_SOURCE}, level 2` },
    ],
  },
};

export type RequiredPlanInput = Pick<PlanSettingsInput, 'startDate' | 'event'> &
  Partial<PlanSettingsInput>;

/** Settings with safe defaults for everything the clinician has not given. Throws a ZodError if invalid. */
export function defaultPlanSettings(input: RequiredPlanInput): PlanSettings {
  return PlanSettingsSchema.parse(input);
}

/** Rest weekdays (ISO, 1 = Monday): the chosen ones, else spread through the week ending on Sunday. */
export function restWeekdaysOf(settings: PlanSettings): number[] {
  if (settings.restWeekdays) return settings.restWeekdays;
  const spread: Record<number, number[]> = { 0: [], 1: [7], 2: [3, 7], 3: [2, 5, 7] };
  return spread[settings.restDaysPerWeek] ?? [];
}
