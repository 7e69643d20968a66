import type { CheckIn, GateAnswer } from '../../shared/schemas/check-in';
import type { PlanSettings } from '../../shared/schemas/plan-settings';
import { addDays, isRestDay, progressionState, sessionsForDate, toDay } from '../../shared/scheduler';

/** A demo day on which a gate goes over the threshold: the nth playing day before today (1 = the latest). */
export interface DemoPainDay {
  playingDaysAgo: number;
  afterBlock: number;
  pain: number;
}

function playingDayBefore(settings: PlanSettings, until: string, playingDaysAgo: number): string {
  let date = until;
  for (let found = 0; found < playingDaysAgo; ) {
    date = addDays(date, -1);
    if (!isRestDay(settings, toDay(date))) found += 1;
  }
  return date;
}

/**
 * Invents a plausible check-in history for the demo: every planned session played in full with clean
 * gates and clean next mornings, except on the pain days, where the session stops at that gate.
 * The plan as it stood each day comes from the engine, so the history follows its own step backs.
 */
export function demoHistory(settings: PlanSettings, until: string, painDays: DemoPainDay[] = []): CheckIn[] {
  const history: CheckIn[] = [];
  const pains = painDays.map((day) => ({ ...day, date: playingDayBefore(settings, until, day.playingDaysAgo) }));
  for (let date = settings.startDate; date < until; date = addDays(date, 1)) {
    const state = progressionState({ settings, checkIns: history, overrides: [], today: date });
    const programme = sessionsForDate(settings, state, date);
    const pain = pains.find((day) => day.date === date);
    for (const session of programme.sessions) {
      const blocks = session.items.filter((item) => item.kind === 'gate' && item.gate?.position !== 'before').length;
      const stopAt = pain ? Math.min(pain.afterBlock, blocks) : blocks;
      const gates: GateAnswer[] = [{ position: 'before', pain: 0 }];
      for (let block = 1; block <= stopAt; block += 1) {
        const over = pain !== undefined && block === stopAt;
        gates.push({ position: block === blocks ? 'after' : 'between', afterBlock: block, pain: over ? pain.pain : 0 });
      }
      const played = Math.round((session.playingMinutes * stopAt) / Math.max(1, blocks));
      history.push({
        kind: 'session',
        date,
        sessionIndex: session.index,
        gates,
        redFlags: [],
        effort: pain ? 5 : 3,
        minutesPlayed: played,
        recordedAt: session.startsAt,
      });
      if (pain) break;
    }
    if (programme.sessions.length > 0 && addDays(date, 1) < until) {
      history.push({ kind: 'next_morning', date: addDays(date, 1), pain: 0, redFlags: [] });
    }
  }
  return history;
}
