import { PlanSettingsSchema, defaultPlanSettings, publishedLevelsPreset } from '@/shared/scheduler';
import { SHOWCASE, settingsWith } from './fixtures';

function messages(input: Record<string, unknown>): string[] {
  const result = PlanSettingsSchema.safeParse({ startDate: '2025-03-03', event: SHOWCASE, ...input });
  return result.success ? [] : result.error.issues.map((i) => i.message);
}

describe('plan settings', () => {
  it('does fill safe defaults when only the start and the event are given', () => {
    const s = defaultPlanSettings({ startDate: '2025-03-03', event: SHOWCASE });
    expect(s.timeZone).toBe('Europe/London');
    // BAPAM level 1 (10 minutes a day, blocks of 5, rest 60) is the default starting point.
    expect([s.startMinutesPerDay, s.startBlockMinutes, s.startRestMinutes]).toEqual([10, 5, 60]);
    // Klickstein 2009, The Musician's Way, p. 75: a 5-minute pause after 25 minutes.
    expect([s.targetBlockMinutes, s.targetRestMinutes]).toEqual([25, 5]);
    // Horvath, Playing (Less) Hurt: one day a week off.
    expect(s.restDaysPerWeek).toBe(1);
    // BAPAM: 3 to 7 days a level; no pain allowed (stricter than Silbernagel et al. 2007's 5/10).
    expect([s.minDaysPerStage, s.maxDaysPerStage]).toEqual([3, 7]);
    expect(s.painThreshold).toEqual({ session: 0, nextMorning: 0 });
    // Common practice, no published source: bursts of demanding passages of at most 2 minutes.
    expect(s.maxBurstMinutes).toBe(2);
  });

  it('does reject an event before the start when the dates are swapped', () => {
    expect(messages({ event: { name: 'x', date: '2025-03-01' } })).toContain('The event must come after the start date');
  });

  it('does reject a target below the minutes tolerated now when they are inverted', () => {
    expect(messages({ startMinutesPerDay: 30, targetMinutesPerDay: 20 })).toContain(
      'The target cannot be below the minutes tolerated now',
    );
  });

  it('does reject rests shorter than 10 minutes per hour when blocks are long (Klickstein 2009, p. 75)', () => {
    expect(messages({ targetBlockMinutes: 40, targetRestMinutes: 5 })).toContain('Rest at least 1 minute for every 5 minutes played');
    expect(messages({ targetBlockMinutes: 40, targetRestMinutes: 8 })).toEqual([]);
  });

  it('does reject tiers unlocking out of order when demanding comes before moderate', () => {
    expect(messages({ tierUnlockStage: { easy: 1, moderate: 5, demanding: 3 } })).toContain(
      'Tiers unlock in order: easy, then moderate, then demanding',
    );
  });

  it('does reject caps too small to add a minute when growth is 5% of 10 minutes', () => {
    expect(messages({ maxStageGrowthPercent: 5 })).toContain('The growth caps are too small to add a single minute');
  });

  it('does reject an unknown time zone when one is misspelt', () => {
    expect(messages({ timeZone: 'Europe/Lodnon' })).toContain('Unknown time zone');
  });

  it('does reject a target that no number of sessions can hold when sessions are capped', () => {
    expect(messages({ targetMinutesPerDay: 200, maxSessionsPerDay: 2, maxSessionMinutes: 60 })).toContain(
      'The target needs more sessions or longer sessions per day',
    );
  });

  it('does accept the published-levels preset when combined with the required fields', () => {
    const s = settingsWith(publishedLevelsPreset.values);
    expect(s.fixedLevels).toHaveLength(2);
  });

  it('does reject a fixed level that grows faster than the caps when the caps are lowered', () => {
    expect(messages({ ...publishedLevelsPreset.values, maxWeeklyGrowthPercent: 50 })).toContain(
      'A fixed level grows faster than the caps allow',
    );
  });
});
