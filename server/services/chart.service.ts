import { buildLadder, loadReport, progressionState, sessionsForRange } from '../../shared/scheduler';
import type { LoadSummary, PlayingChart } from '../../shared/schemas/chart';
import type { Db } from '../db/client';
import { HttpError } from '../lib/http-error';
import { overThreshold } from './check-in.service';
import { ownMusician } from './own-musician';
import { loadActivePlan } from './plan.service';

export function activePlanOf(db: Db, clinicianId: string, musicianId: string) {
  ownMusician(db, clinicianId, musicianId);
  const loaded = loadActivePlan(db, musicianId);
  if (!loaded) throw new HttpError(404, 'no_active_plan', 'This musician has no active plan yet.');
  return loaded;
}

/**
 * Planned minutes per day are the engine's sessions on the current progression (so past days show
 * what was planned after holds and step backs); played minutes and pain come from the check-ins.
 */
export function playingChart(db: Db, clinicianId: string, musicianId: string, now: Date): PlayingChart {
  const loaded = activePlanOf(db, clinicianId, musicianId);
  const { settings } = loaded;
  const state = progressionState({ ...loaded, today: now });
  const played = new Map(loadReport(loaded.checkIns, settings.startDate, state.today).days.map((d) => [d.date, d.minutes]));
  const days = sessionsForRange(settings, state, settings.startDate, settings.event.date).map((day) => {
    const reported = loaded.checkIns.filter((c) => c.date === day.date);
    const gates = reported.flatMap((c) => (c.kind === 'session' ? c.gates.map((g) => g.pain) : c.kind === 'next_morning' ? [] : [c.pain]));
    const mornings = reported.flatMap((c) => (c.kind === 'next_morning' ? [c.pain] : []));
    return {
      date: day.date,
      kind: day.kind,
      stageNumber: day.stageIndex === null ? null : day.stageIndex + 1,
      plannedMinutes: day.playingMinutes,
      playedMinutes: day.date <= state.today ? (played.get(day.date) ?? 0) : null,
      sessionPain: gates.length > 0 ? Math.max(...gates) : null,
      morningPain: mornings.length > 0 ? Math.max(...mornings) : null,
      overThreshold: reported.some((c) => overThreshold(c, settings.painThreshold)),
      redFlag: reported.some((c) => c.redFlags.length > 0),
    };
  });
  const ladder = buildLadder(settings);
  return {
    today: state.today,
    startDate: settings.startDate,
    event: settings.event,
    painThreshold: settings.painThreshold,
    days,
    stages: state.periods.map((p) => ({
      stageNumber: p.stageIndex + 1,
      startDate: p.startDate,
      endDate: p.endDate,
      minutesPerDay: ladder[p.stageIndex]?.minutesPerDay ?? 0,
      kind: p.kind,
    })),
  };
}

/** Minutes and load per day, the three ratios and the soft warning, from the engine. */
export function loadSummary(db: Db, clinicianId: string, musicianId: string, now: Date): LoadSummary {
  const loaded = activePlanOf(db, clinicianId, musicianId);
  const state = progressionState({ ...loaded, today: now });
  return { today: state.today, ...loadReport(loaded.checkIns, loaded.settings.startDate, state.today) };
}
