import fc from 'fast-check';
import { addDays, defaultPlanSettings, fromDay, type CheckIn, type PlanSettings } from '@/shared/scheduler';

const ZONES = ['Europe/London', 'America/New_York', 'Australia/Sydney', 'Asia/Tokyo', 'UTC'];

/** Random valid settings: every value inside the ranges a clinician could set. */
export const settingsArb: fc.Arbitrary<PlanSettings> = fc
  .record({
    startDay: fc.integer({ min: 19_723, max: 21_184 }), // 2024-01-01 .. 2027-12-31
    eventAfter: fc.integer({ min: 14, max: 200 }),
    timeZone: fc.constantFrom(...ZONES),
    start: fc.integer({ min: 5, max: 60 }),
    extra: fc.integer({ min: 0, max: 150 }),
    sessions: fc.integer({ min: 1, max: 4 }),
    sessionMinutes: fc.integer({ min: 30, max: 90 }),
    startBlock: fc.integer({ min: 1, max: 30 }),
    startRest: fc.integer({ min: 0, max: 90 }),
    targetBlock: fc.integer({ min: 5, max: 40 }),
    targetRest: fc.integer({ min: 0, max: 30 }),
    restDays: fc.integer({ min: 0, max: 3 }),
    minDays: fc.integer({ min: 1, max: 7 }),
    maxExtra: fc.integer({ min: 0, max: 7 }),
    step: fc.integer({ min: 1, max: 30 }),
    stageCap: fc.integer({ min: 20, max: 150 }),
    weekCap: fc.integer({ min: 20, max: 200 }),
    unlocks: fc.array(fc.integer({ min: 1, max: 10 }), { minLength: 3, maxLength: 3 }),
    passages: fc.integer({ min: 1, max: 10 }),
    burst: fc.integer({ min: 1, max: 5 }),
    easyGap: fc.integer({ min: 1, max: 10 }),
    taperDays: fc.integer({ min: 0, max: 3 }),
    taperPercent: fc.integer({ min: 30, max: 100 }),
    failures: fc.integer({ min: 1, max: 3 }),
    nextMorning: fc.boolean(),
  })
  .map((r) => {
    const [easy = 1, moderate = 1, demanding = 1] = [...r.unlocks].sort((a, b) => a - b);
    const startDate = fromDay(r.startDay);
    const start = Math.min(r.start, r.sessions * r.sessionMinutes);
    return defaultPlanSettings({
      startDate,
      timeZone: r.timeZone,
      event: { name: 'Invented recital', date: addDays(startDate, r.eventAfter) },
      startMinutesPerDay: start,
      targetMinutesPerDay: Math.min(start + r.extra, r.sessions * r.sessionMinutes),
      maxSessionsPerDay: r.sessions,
      maxSessionMinutes: r.sessionMinutes,
      startBlockMinutes: r.startBlock,
      startRestMinutes: Math.max(r.startRest, Math.ceil(r.startBlock / 5)),
      targetBlockMinutes: r.targetBlock,
      targetRestMinutes: Math.max(r.targetRest, Math.ceil(r.targetBlock / 5)),
      restDaysPerWeek: r.restDays,
      minDaysPerStage: r.minDays,
      maxDaysPerStage: r.minDays + r.maxExtra,
      stepMinutes: r.step,
      maxStageGrowthPercent: r.stageCap,
      maxWeeklyGrowthPercent: r.weekCap,
      tierUnlockStage: { easy, moderate, demanding },
      passagesUnlockStage: r.passages,
      maxBurstMinutes: r.burst,
      easyBetweenBurstsMinutes: r.easyGap,
      taperDays: r.taperDays,
      taperPercent: r.taperPercent,
      failuresBeforeStepBack: r.failures,
      requireNextMorningCheck: r.nextMorning,
    });
  });

export type DayEvent = 'none' | 'clean' | 'pain' | 'morning_pain';

const dayEventArb = fc.constantFrom<DayEvent>('none', 'clean', 'clean', 'clean', 'clean', 'pain', 'morning_pain');

/** A history of daily events (no red flags) turned into check-ins from the plan's start. */
export function historyArb(maxDays = 60): fc.Arbitrary<DayEvent[]> {
  return fc.array(dayEventArb, { maxLength: maxDays });
}

export function checkInsFrom(settings: PlanSettings, events: DayEvent[], pain = 6): CheckIn[] {
  const out: CheckIn[] = [];
  events.forEach((event, i) => {
    const date = addDays(settings.startDate, i);
    if (event === 'none') return;
    const bad = event === 'pain';
    out.push({
      kind: 'session',
      date,
      sessionIndex: 0,
      gates: [{ position: 'between', afterBlock: 1, pain: bad ? pain : 0 }],
      redFlags: [],
      effort: 3,
      minutesPlayed: 5,
    });
    out.push({ kind: 'next_morning', date: addDays(date, 1), pain: event === 'morning_pain' ? pain : 0, redFlags: [] });
  });
  return out;
}
