import type { PainReport, RedFlag, SessionCheckIn } from '../schemas/check-in';
import type { Override } from '../schemas/override';
import type { PlanSettings } from '../schemas/plan-settings';
import { fromDay } from './dates';
import { gateWhere, spokenDate, type HistoryEvent, type HistoryKind, type ProgressionStatus } from './history';
import type { Level } from './ladder';
import { sessionsPlannedOn } from './sessions';
import { isRestDay } from './stages';

/** The running state while check-ins and overrides are replayed (day numbers, see dates.ts). */
export type Sim = {
  stage: number;
  periods: { stageIndex: number; startDay: number }[];
  done: number;
  failures: number;
  pending: number | null;
  held: boolean;
  status: ProgressionStatus;
  stoppedSince: string | null;
  redFlags: RedFlag[];
  sessionEndedOn: string | null;
  history: HistoryEvent[];
  levels: number[];
};

export type Hooks = {
  stop: (day: number, flags: RedFlag[]) => void;
  fail: (day: number, cause: string, effectiveDay: number) => void;
  log: (day: number, kind: HistoryKind, from: number, message: string, by?: string) => void;
};

/**
 * The day's session check-ins: a gate over the threshold fails the day, a red flag stops all playing.
 * A day counts toward moving up only once every session of its programme has been played without
 * symptoms: part of a day says nothing yet about the stage's full load (common practice: progress on the
 * level as prescribed). A day left short is said so in the history once it is over.
 */
export function processSessions(
  settings: PlanSettings, ladder: Level[], s: Sim, day: number, list: SessionCheckIn[], h: Hooks, isToday = false,
): void {
  if (list.length === 0) return;
  let failed = false;
  let played = 0;
  for (const c of [...list].sort((a, b) => a.sessionIndex - b.sessionIndex)) {
    played += c.minutesPlayed;
    const bad = c.gates.find((g) => g.pain > settings.painThreshold.session);
    if (bad && !failed) {
      failed = true;
      s.sessionEndedOn = fromDay(day);
      h.fail(day, `pain ${bad.pain} ${gateWhere(bad)}`, day + 1);
    }
    if (c.redFlags.length > 0) h.stop(day, c.redFlags);
  }
  const planned = ladder[s.stage]?.minutesPerDay ?? 0;
  if (played > planned && !failed)
    h.log(day, 'over_time', s.stage, `Played ${played} minutes on ${spokenDate(fromDay(day))}, more than the ${planned} planned: keep to the timings even when it feels fine.`);
  if (failed || s.stoppedSince || isRestDay(settings, day)) return;
  const level = ladder[s.stage];
  const due = level ? sessionsPlannedOn(settings, level, fromDay(day)) : 0;
  const sessionsPlayed = new Set(list.map((c) => c.sessionIndex)).size;
  if (sessionsPlayed < due) {
    if (!isToday)
      h.log(day, 'short_day', s.stage, `Played ${sessionsPlayed} of ${due} sessions on ${spokenDate(fromDay(day))}: a stage moves up on full days only, so this day does not count.`);
    return;
  }
  if (settings.requireNextMorningCheck) s.pending = day;
  else s.done += 1;
}

/**
 * Pain reported outside a session: over the session threshold it ends the day's playing and counts as a
 * failed day (BAPAM: symptoms mean back to the previous level); a red flag stops all playing.
 */
export function processReports(settings: PlanSettings, s: Sim, day: number, list: PainReport[], h: Hooks): void {
  for (const report of list) {
    if (report.pain > settings.painThreshold.session && s.sessionEndedOn !== fromDay(day)) {
      s.sessionEndedOn = fromDay(day);
      h.fail(day, `pain ${report.pain} reported outside a session`, day + 1);
    }
    if (report.redFlags.length > 0) h.stop(day, report.redFlags);
  }
}

export function applyOverride(
  ladder: Level[], s: Sim, day: number, o: Override,
  h: { moveTo: (i: number, d: number) => void; log: Hooks['log'] },
): void {
  const from = s.stage;
  const why = `${o.reason} (${o.by})`;
  const when = spokenDate(fromDay(day));
  if (o.action === 'advance' && ladder[s.stage + 1]) {
    h.moveTo(s.stage + 1, day + 1);
    s.held = false;
    if (!s.stoppedSince) s.status = 'on_track';
    h.log(day, 'clinician_advance', from, `Clinician moved up to stage ${s.stage + 1} on ${when}: ${why}.`, o.by);
  } else if (o.action === 'step_back' && s.stage > 0) {
    h.moveTo(s.stage - 1, day + 1);
    if (!s.stoppedSince) s.status = 'stepped_back';
    h.log(day, 'clinician_step_back', from, `Clinician stepped back to stage ${s.stage + 1} on ${when}: ${why}.`, o.by);
  } else if (o.action === 'hold') {
    s.held = true;
    if (!s.stoppedSince) s.status = 'held';
    h.log(day, 'clinician_hold', from, `Clinician held progression on ${when}: ${why}.`, o.by);
  } else if (o.action === 'resume' && s.held) {
    s.held = false;
    if (!s.stoppedSince) s.status = 'on_track';
    h.log(day, 'clinician_resume', from, `Clinician resumed progression on ${when}: ${why}.`, o.by);
  } else if (o.action === 'clear_red_flag' && s.stoppedSince) {
    s.stoppedSince = null;
    s.redFlags = [];
    s.done = 0;
    s.status = s.held ? 'held' : 'on_track';
    h.log(day, 'red_flag_cleared', from, `Clinician cleared the red flag on ${when}: ${why}. The stage starts again.`, o.by);
  }
}

