import type { CheckIn } from '../schemas/check-in';
import { addDays } from './dates';

export type DailyLoad = {
  date: string;
  minutes: number;
  /** Sum of session loads (effort x minutes); sessions without an effort rating add none. */
  load: number;
  sessionsWithoutEffort: number;
};

/** Session load = CR-10 effort x minutes (Foster et al. 2001, J Strength Cond Res 15(1):109-115). */
export function sessionLoad(effort: number, minutes: number): number {
  return effort * minutes;
}

/** Minutes and load for every day from `from` to `to` inclusive; days without check-ins are 0. */
export function dailyLoads(checkIns: CheckIn[], from: string, to: string): DailyLoad[] {
  const byDate = new Map<string, DailyLoad>();
  for (let d = from; d <= to; d = addDays(d, 1)) byDate.set(d, { date: d, minutes: 0, load: 0, sessionsWithoutEffort: 0 });
  for (const c of checkIns) {
    const day = c.kind === 'session' ? byDate.get(c.date) : undefined;
    if (!day || c.kind !== 'session') continue;
    day.minutes += c.minutesPlayed;
    if (c.effort === undefined) day.sessionsWithoutEffort += 1;
    else day.load += sessionLoad(c.effort, c.minutesPlayed);
  }
  return [...byDate.values()];
}

const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);

export type RollingRatio = { acute: number; chronic: number; ratio: number };

/**
 * Acute:chronic ratio from rolling sums (Hulin et al. 2014, Br J Sports Med 48(8):708-712): acute = the
 * last 7 days' load; chronic = the average weekly load of the last 4 weeks. "coupled" includes the acute
 * week in the chronic average; "uncoupled" averages the 3 weeks before it. Needs 28 days of data
 * (oldest first, today last); null before that or when the chronic load is 0.
 */
export function rollingRatio(loads: number[], coupling: 'coupled' | 'uncoupled' = 'coupled'): RollingRatio | null {
  if (loads.length < 28) return null;
  const last28 = loads.slice(-28);
  const acute = sum(last28.slice(-7));
  const chronic = coupling === 'coupled' ? sum(last28) / 4 : sum(last28.slice(0, 21)) / 3;
  return chronic > 0 ? { acute, chronic, ratio: acute / chronic } : null;
}

/**
 * Exponentially weighted moving average (Williams et al. 2017, Br J Sports Med 51(3):209):
 * EWMA_today = load_today x lambda + (1 - lambda) x EWMA_yesterday, lambda = 2 / (N + 1).
 * Seeded with 0: the musician had stopped playing before the plan (our choice; the paper leaves it open).
 */
export function ewmaSeries(loads: number[], n: number, seed = 0): number[] {
  const lambda = 2 / (n + 1);
  const out: number[] = [];
  let prev = seed;
  for (const load of loads) {
    prev = load * lambda + (1 - lambda) * prev;
    out.push(prev);
  }
  return out;
}

export type EwmaRatio = { acute: number; chronic: number; ratio: number };

/** EWMA acute (N = 7) over chronic (N = 28) on the last day; null before 28 days or with no chronic load. */
export function ewmaRatio(loads: number[], acuteN = 7, chronicN = 28): EwmaRatio | null {
  if (loads.length < chronicN) return null;
  const acute = ewmaSeries(loads, acuteN).at(-1) ?? 0;
  const chronic = ewmaSeries(loads, chronicN).at(-1) ?? 0;
  return chronic > 0 ? { acute, chronic, ratio: acute / chronic } : null;
}

export type LoadWarningLevel = 'none' | 'above_range' | 'well_above_range';
export type LoadWarning = { level: LoadWarningLevel; ratio: number | null; message: string | null };

/**
 * Soft prompts at the thresholds of Gabbett 2016 (Br J Sports Med 50:273-280): 0.8-1.3 "sweet spot",
 * 1.5 and above "danger zone". Sport-derived and disputed (Impellizzeri et al. 2020), so worded as a
 * prompt for the clinician, never as a verdict.
 */
export function loadWarning(ratio: number | null): LoadWarning {
  if (ratio === null || ratio <= 1.3) return { level: 'none', ratio, message: null };
  const shown = ratio.toFixed(2);
  if (ratio >= 1.5)
    return {
      level: 'well_above_range',
      ratio,
      message: `Recent playing load is ${shown} times the 4-week level (1.5 or more). Worth reviewing with the musician whether to hold the plan; sport-derived guide, not a verdict.`,
    };
  return {
    level: 'above_range',
    ratio,
    message: `Recent playing load is ${shown} times the 4-week level (above 1.3). Worth a look at recent sessions; sport-derived guide, not a verdict.`,
  };
}

export type LoadReport = {
  days: DailyLoad[];
  rolling: RollingRatio | null;
  rollingUncoupled: RollingRatio | null;
  ewma: EwmaRatio | null;
  warning: LoadWarning;
};

/** Loads from the start date to today, the three ratios, and the warning on the stronger of them. */
export function loadReport(checkIns: CheckIn[], startDate: string, today: string): LoadReport {
  const days = dailyLoads(checkIns, startDate, today);
  const loads = days.map((d) => d.load);
  const rolling = rollingRatio(loads, 'coupled');
  const ewma = ewmaRatio(loads);
  const ratios = [rolling?.ratio, ewma?.ratio].filter((r): r is number => r !== undefined);
  return {
    days,
    rolling,
    rollingUncoupled: rollingRatio(loads, 'uncoupled'),
    ewma,
    warning: loadWarning(ratios.length > 0 ? Math.max(...ratios) : null),
  };
}
