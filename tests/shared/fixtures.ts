import {
  addDays,
  defaultPlanSettings,
  isRestDay,
  progressionState,
  sessionsForDate,
  toDay,
  type CheckIn,
  type PlanSettings,
  type RequiredPlanInput,
} from '@/shared/scheduler';

/** Invented scenario: a conservatory's spring showcase. */
export const SHOWCASE = { name: 'Invented spring showcase', date: '2025-04-26' };

export function settingsWith(values: Partial<RequiredPlanInput> = {}): PlanSettings {
  return defaultPlanSettings({ startDate: '2025-03-03', event: SHOWCASE, ...values });
}

export function cleanSession(date: string, minutes = 10, sessionIndex = 0): CheckIn {
  return {
    kind: 'session',
    date,
    sessionIndex,
    gates: [
      { position: 'before', pain: 0 },
      { position: 'after', afterBlock: 2, pain: 0 },
    ],
    redFlags: [],
    effort: 3,
    minutesPlayed: minutes,
  };
}

export function painfulSession(date: string, pain: number, afterBlock = 2): CheckIn {
  return {
    kind: 'session',
    date,
    sessionIndex: 0,
    gates: [
      { position: 'before', pain: 0 },
      { position: 'between', afterBlock, pain },
    ],
    redFlags: [],
    effort: 4,
    minutesPlayed: 10,
  };
}

export function morning(date: string, pain = 0, redFlags: CheckIn['redFlags'] = []): CheckIn {
  return { kind: 'next_morning', date, pain, redFlags };
}

/**
 * A musician who plays every session of every playing day from `from` to `to` as the plan then stands,
 * without symptoms, and checks the next morning.
 */
export function followPlan(settings: PlanSettings, from: string, to: string, earlier: CheckIn[] = []): CheckIn[] {
  const out: CheckIn[] = [];
  for (let d = from; d <= to; d = addDays(d, 1)) {
    if (isRestDay(settings, toDay(d))) continue;
    const state = progressionState({ settings, checkIns: [...earlier, ...out], overrides: [], today: d });
    const { sessions } = sessionsForDate(settings, state, d);
    if (sessions.length === 0) continue;
    for (const session of sessions) out.push(cleanSession(d, session.playingMinutes, session.index));
    out.push(morning(addDays(d, 1)));
  }
  return out;
}
