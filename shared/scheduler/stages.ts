import type { PlanSettings } from '../schemas/plan-settings';
import { fromDay, isoWeekday, toDay, type DayNumber } from './dates';
import { buildLadder, type Level } from './ladder';
import { restWeekdaysOf } from './settings';

/** A level placed on the calendar. `endDate` is inclusive. */
export type Stage = Level & { startDate: string; endDate: string };

/** When a stage is (or is expected to be) played. */
export type StagePeriod = {
  stageIndex: number;
  startDate: string;
  endDate: string;
  kind: 'actual' | 'projected';
};

/** Rest days have no playing; the event day is never a rest day. */
export function isRestDay(settings: PlanSettings, day: DayNumber): boolean {
  if (day === toDay(settings.event.date)) return false;
  return restWeekdaysOf(settings).includes(isoWeekday(day));
}

export type ScheduleFrom = {
  stageIndex: number;
  /** First day of the current stage's period (may be before `fromDay`). */
  periodStartDay: DayNumber;
  /** First day still to be played. */
  fromDay: DayNumber;
  /** Playing days already passed at the current stage. */
  doneDays: number;
  /** Planned minutes per day on days before `fromDay` (the weekly cap looks back 7 days). */
  levelBefore: (day: DayNumber) => number;
};

const MAX_DAYS = 5 * 366;

/**
 * Places the remaining levels on the calendar as early as the rules allow: each stage lasts its
 * minimum playing days (rest days do not count), and a stage starts only when its minutes per day are
 * within the weekly cap of the minutes planned 7 days earlier; otherwise the stage before is extended.
 */
export function scheduleLadder(
  settings: PlanSettings,
  ladder: Level[],
  from: ScheduleFrom,
): StagePeriod[] {
  const periods: StagePeriod[] = [];
  const projected: number[] = [];
  const levelAt = (day: DayNumber) =>
    day < from.fromDay ? from.levelBefore(day) : (projected[day - from.fromDay] ?? 0);
  const weekCap = 1 + settings.maxWeeklyGrowthPercent / 100;
  const eventDay = toDay(settings.event.date);
  let index = from.stageIndex;
  let start = from.periodStartDay;
  let done = from.doneDays;
  for (let day = from.fromDay; day < from.fromDay + MAX_DAYS; day += 1) {
    const level = ladder[index];
    if (!level) break;
    const next = ladder[index + 1];
    if (next && done >= settings.minDaysPerStage && next.minutesPerDay <= levelAt(day - 7) * weekCap + 1e-9) {
      periods.push({ stageIndex: index, startDate: fromDay(start), endDate: fromDay(day - 1), kind: 'projected' });
      index += 1;
      start = day;
      done = 0;
    }
    const current = ladder[index];
    projected.push(current ? current.minutesPerDay : 0);
    if (!isRestDay(settings, day)) done += 1;
    if (!next && done >= settings.minDaysPerStage && day >= eventDay) {
      periods.push({ stageIndex: index, startDate: fromDay(start), endDate: fromDay(day), kind: 'projected' });
      return periods;
    }
  }
  periods.push({ stageIndex: index, startDate: fromDay(start), endDate: fromDay(from.fromDay + MAX_DAYS), kind: 'projected' });
  return periods;
}

/** The plan's stages on the calendar from the start date, before any check-in. */
export function buildStages(settings: PlanSettings): Stage[] {
  const ladder = buildLadder(settings);
  const startDay = toDay(settings.startDate);
  const first = ladder[0]?.minutesPerDay ?? settings.startMinutesPerDay;
  const periods = scheduleLadder(settings, ladder, {
    stageIndex: 0,
    periodStartDay: startDay,
    fromDay: startDay,
    doneDays: 0,
    levelBefore: () => first,
  });
  return periods.flatMap((p) => {
    const level = ladder[p.stageIndex];
    return level ? [{ ...level, startDate: p.startDate, endDate: p.endDate }] : [];
  });
}

/** The period covering a date; dates after the last period stay at the last stage. */
export function periodOn<T extends { startDate: string; endDate: string }>(periods: T[], date: string): T | undefined {
  for (const p of periods) if (p.startDate <= date && date <= p.endDate) return p;
  const last = periods[periods.length - 1];
  return last && date > last.endDate ? last : undefined;
}
