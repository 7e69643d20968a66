import type { CheckIn, PainReport, RedFlag, SessionCheckIn } from '../schemas/check-in';
import type { Override } from '../schemas/override';
import type { Piece } from '../schemas/piece';
import type { PlanSettings } from '../schemas/plan-settings';
import { fromDay, planToday, toDay } from './dates';
import { feasibilityOf, type Feasibility } from './feasibility';
import { redFlagWords, spokenDate, type HistoryEvent, type HistoryKind, type ProgressionStatus } from './history';
import { applyOverride, processReports, processSessions, type Sim } from './progression-steps';
import { buildLadder, type Level } from './ladder';
import { isRestDay, scheduleLadder, type StagePeriod } from './stages';

export type ProgressionInput = {
  settings: PlanSettings;
  checkIns: CheckIn[];
  overrides: Override[];
  /** Today's plan date (`YYYY-MM-DD`) or the current instant, read in the plan's time zone. */
  today: string | Date;
  pieces?: Piece[];
};

export type ProgressionState = {
  today: string;
  /** 0-based stage for the next session, and its 1-based number. */
  stageIndex: number;
  stageNumber: number;
  stageCount: number;
  stage: Level;
  status: ProgressionStatus;
  /** Playing days passed without symptoms at the current stage (confirmed or awaiting the next morning). */
  cleanDays: number;
  /** Stages as played so far ("actual") and as now expected ("projected"); remaining ones start no earlier than today. */
  periods: StagePeriod[];
  feasibility: Feasibility;
  history: HistoryEvent[];
  /** Set while a red flag stops all playing. */
  stoppedSince: string | null;
  redFlags: RedFlag[];
  /** The date a pain gate ended a session (no more playing that day). */
  sessionEndedOn: string | null;
  /** Prompts for the clinician (never verdicts). */
  prompts: string[];
};

function byDate<T extends { date: string }>(items: T[]): Map<string, T[]> {
  const map = new Map<string, T[]>();
  for (const item of items) map.set(item.date, [...(map.get(item.date) ?? []), item]);
  return map;
}

/**
 * Replays the check-ins and clinician overrides day by day from the start date to today.
 * Each day: the next-morning check (about yesterday), then any due move up, then the day's sessions,
 * then the clinician's overrides (they answer what was reported). Rules: a gate above the threshold
 * ends the session and, after `failuresBeforeStepBack` failed days, steps back one stage (BAPAM: back
 * to the previous level until you can progress), otherwise holds; a stage is passed after its minimum
 * full playing days (every planned session) without symptoms, including the next morning; a red flag
 * stops all playing until cleared.
 */
export function progressionState(input: ProgressionInput): ProgressionState {
  const { settings } = input;
  const ladder = buildLadder(settings);
  const today = planToday(input.today, settings.timeZone);
  const startDay = toDay(settings.startDate);
  const todayDay = toDay(today);
  const mornings = byDate(input.checkIns.filter((c) => c.kind === 'next_morning'));
  const sessions = byDate(input.checkIns.filter((c): c is SessionCheckIn => c.kind === 'session'));
  const reports = byDate(input.checkIns.filter((c): c is PainReport => c.kind === 'pain_report'));
  const overrides = byDate([...input.overrides].sort((a, b) => a.at.localeCompare(b.at)));
  const s: Sim = {
    stage: 0, periods: [{ stageIndex: 0, startDay }], done: 0, failures: 0, pending: null, held: false,
    status: 'on_track', stoppedSince: null, redFlags: [], sessionEndedOn: null, history: [], levels: [],
  };
  const number = (i: number) => i + 1;
  const log = (day: number, kind: HistoryKind, from: number, message: string, by?: string) =>
    s.history.push({ date: fromDay(day), kind, fromStage: number(from), toStage: number(s.stage), message, ...(by ? { by } : {}) });
  const moveTo = (index: number, effectiveDay: number) => {
    s.stage = index;
    s.done = 0;
    s.failures = 0;
    s.pending = null;
    const last = s.periods[s.periods.length - 1];
    if (last && last.startDay === effectiveDay) last.stageIndex = index;
    else s.periods.push({ stageIndex: index, startDay: effectiveDay });
  };
  const stop = (day: number, flags: RedFlag[]) => {
    s.stoppedSince ??= fromDay(day);
    s.redFlags = [...new Set([...s.redFlags, ...flags])];
    s.status = 'stopped';
    s.pending = null;
    s.done = 0;
    log(day, 'stopped', s.stage, `Stopped on ${spokenDate(fromDay(day))}: ${redFlagWords(flags)} reported. No playing until a clinician has reviewed it.`);
  };
  const fail = (day: number, cause: string, effectiveDay: number) => {
    const from = s.stage;
    s.failures += 1;
    s.done = 0;
    s.pending = null;
    if (s.failures >= settings.failuresBeforeStepBack && s.stage > 0) {
      moveTo(s.stage - 1, effectiveDay);
      if (s.status !== 'stopped') s.status = 'stepped_back';
      log(day, 'stepped_back', from, `Stepped back to stage ${number(s.stage)} on ${spokenDate(fromDay(day))}: ${cause}.`);
    } else {
      if (s.status !== 'stopped') s.status = 'held';
      log(day, 'held', from, `Held at stage ${number(s.stage)} on ${spokenDate(fromDay(day))}: ${cause}.`);
    }
  };

  for (let day = startDay; day <= todayDay; day += 1) {
    const date = fromDay(day);
    if (s.pending !== null && s.pending < day - 1) s.pending = null;
    for (const m of mornings.get(date) ?? []) {
      if (m.kind !== 'next_morning') continue;
      if (m.pain > settings.painThreshold.nextMorning) fail(day, `pain ${m.pain} the next morning`, day);
      else if (s.pending === day - 1 && m.redFlags.length === 0) {
        s.done += 1;
        s.pending = null;
      }
      // A red flag is logged last so that it is the change people read first.
      if (m.redFlags.length > 0) stop(day, m.redFlags);
    }
    const next = ladder[s.stage + 1];
    const weekAgo = s.levels[day - 7 - startDay] ?? ladder[0]?.minutesPerDay ?? 0;
    const withinCap = next !== undefined && next.minutesPerDay <= weekAgo * (1 + settings.maxWeeklyGrowthPercent / 100) + 1e-9;
    if (!s.stoppedSince && !s.held && s.done >= settings.minDaysPerStage && withinCap) {
      const from = s.stage;
      moveTo(s.stage + 1, day);
      s.status = 'on_track';
      log(day, 'advanced', from, `Moved up to stage ${number(s.stage)} on ${spokenDate(date)} after ${settings.minDaysPerStage} playing days without symptoms.`);
    }
    s.levels.push(ladder[s.stage]?.minutesPerDay ?? 0);
    processSessions(settings, ladder, s, day, sessions.get(date) ?? [], { stop, fail, log }, day === todayDay);
    processReports(settings, s, day, reports.get(date) ?? [], { stop, fail, log });
    for (const o of overrides.get(date) ?? []) applyOverride(ladder, s, day, o, { moveTo, log });
  }
  return finish(input, ladder, s, todayDay, sessions.has(today));
}

function finish(input: ProgressionInput, ladder: Level[], s: Sim, todayDay: number, playedToday: boolean): ProgressionState {
  const { settings } = input;
  const startDay = toDay(settings.startDate);
  const current = s.periods[s.periods.length - 1] ?? { stageIndex: 0, startDay };
  const fromDayNum = Math.max(current.startDay, playedToday ? todayDay + 1 : todayDay);
  const cleanDays = s.done + (s.pending !== null && s.pending >= todayDay - 1 ? 1 : 0);
  const stage = ladder[current.stageIndex] ?? ladder[0];
  if (!stage) throw new Error('The plan has no stages');
  const projected = scheduleLadder(settings, ladder, {
    stageIndex: current.stageIndex,
    periodStartDay: current.startDay,
    fromDay: fromDayNum,
    doneDays: s.stoppedSince ? 0 : cleanDays,
    levelBefore: (d) => (d < startDay ? ladder[0]?.minutesPerDay : s.levels[d - startDay]) ?? stage.minutesPerDay,
  });
  const closed: StagePeriod[] = s.periods.slice(0, -1).map((p, i) => ({
    stageIndex: p.stageIndex,
    startDate: fromDay(p.startDay),
    endDate: fromDay((s.periods[i + 1]?.startDay ?? p.startDay + 1) - 1),
    kind: 'actual',
  }));
  const periods: StagePeriod[] = [
    ...closed,
    ...projected.map((p, i): StagePeriod => (i === 0 ? { ...p, kind: 'actual' } : p)),
  ];
  const last = current.stageIndex === ladder.length - 1;
  const status: ProgressionStatus = s.stoppedSince ? 'stopped' : last && s.status === 'on_track' ? 'complete' : s.status;
  const prompts = promptsFor(settings, s, current.startDay, todayDay);
  return {
    today: fromDay(todayDay), stageIndex: current.stageIndex, stageNumber: stage.number, stageCount: ladder.length, stage, status,
    cleanDays, periods, feasibility: feasibilityOf(settings, ladder, periods, input.pieces ?? []), history: s.history,
    stoppedSince: s.stoppedSince, redFlags: s.redFlags, sessionEndedOn: s.sessionEndedOn, prompts,
  };
}

function promptsFor(settings: PlanSettings, s: Sim, periodStart: number, todayDay: number): string[] {
  const prompts: string[] = [];
  if (s.stoppedSince) prompts.push(`Red flag reported (${redFlagWords(s.redFlags)}): prompt clinical review is needed before any playing.`);
  let playing = 0;
  for (let d = periodStart; d <= todayDay; d += 1) if (!isRestDay(settings, d)) playing += 1;
  if (playing > settings.maxDaysPerStage)
    prompts.push(`At this stage for ${playing} playing days, longer than the usual ${settings.maxDaysPerStage}: consider reviewing the plan or the playing setup.`);
  return prompts;
}
