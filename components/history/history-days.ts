import { addDays } from '@/shared/scheduler';
import type { CheckIn } from '@/shared/schemas/check-in';

export interface HistoryDay {
  date: string;
  minutes: number;
  /** Highest pain reported that day (gates, morning check, pain reports); null when none recorded. */
  maxPain: number | null;
  redFlag: boolean;
}

function painsOf(checkIn: CheckIn): number[] {
  return checkIn.kind === 'session' ? checkIn.gates.map((gate) => gate.pain) : [checkIn.pain];
}

/** One entry per calendar day in the `days` up to `lastDate`, oldest first, from the check-ins. */
export function historyDays(checkIns: CheckIn[], lastDate: string, days: number): HistoryDay[] {
  const out: HistoryDay[] = [];
  for (let i = days - 1; i >= 0; i -= 1) {
    const date = addDays(lastDate, -i);
    const ofDay = checkIns.filter((c) => c.date === date);
    const pains = ofDay.flatMap(painsOf);
    out.push({
      date,
      minutes: ofDay.reduce((sum, c) => sum + (c.kind === 'session' ? c.minutesPlayed : 0), 0),
      maxPain: pains.length > 0 ? Math.max(...pains) : null,
      redFlag: ofDay.some((c) => c.redFlags.length > 0),
    });
  }
  return out;
}

/** The chart in one sentence, for people who do not see it. */
export function historySummary(days: HistoryDay[]): string {
  const played = days.filter((d) => d.minutes > 0);
  const total = played.reduce((sum, d) => sum + d.minutes, 0);
  const painful = days.filter((d) => (d.maxPain ?? 0) > 0);
  const highest = Math.max(0, ...painful.map((d) => d.maxPain ?? 0));
  const flags = days.filter((d) => d.redFlag).length;
  const parts = [`Last ${days.length} days: ${total} min played on ${played.length} day${played.length === 1 ? '' : 's'}`];
  parts.push(painful.length > 0 ? `pain reported on ${painful.length} day${painful.length === 1 ? '' : 's'} (highest ${highest} of 10)` : 'no pain reported');
  if (flags > 0) parts.push(`a warning sign on ${flags} day${flags === 1 ? '' : 's'}`);
  return `${parts.join('; ')}.`;
}
