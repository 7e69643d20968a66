import type { PlanSettings } from '../schemas/plan-settings';
import { addDays, isoWeekday, toDay } from './dates';
import { restWeekdaysOf } from './settings';

const RFC_WEEKDAYS = ['MO', 'TU', 'WE', 'TH', 'FR', 'SA', 'SU'] as const;

/**
 * The plan's weekly rest days as one RFC 5545 recurrence: a whole-day event from the first rest day on or
 * after the start, repeating until the day before the event (the event day itself is never a rest day).
 * Null when the plan has no rest days or none falls before the event.
 */
export function restDayRecurrence(settings: PlanSettings): { firstDate: string; rule: string } | null {
  const weekdays = restWeekdaysOf(settings);
  if (weekdays.length === 0) return null;
  const lastDate = addDays(settings.event.date, -1);
  let firstDate = settings.startDate;
  while (!weekdays.includes(isoWeekday(toDay(firstDate))) && firstDate <= lastDate) firstDate = addDays(firstDate, 1);
  if (firstDate > lastDate) return null;
  const byDay = [...weekdays].sort().map((weekday) => RFC_WEEKDAYS[weekday - 1]).join(',');
  return { firstDate, rule: `FREQ=WEEKLY;BYDAY=${byDay};UNTIL=${lastDate.replaceAll('-', '')}` };
}
