import type { GatePosition } from '../schemas/check-in';
import type { PlanSettings } from '../schemas/plan-settings';
import type { Tier } from '../schemas/piece';
import { addDays, instantOf, toDay } from './dates';
import { buildLadder, type Level } from './ladder';
import { buildStages, isRestDay, periodOn } from './stages';

export type ItemKind = 'gate' | 'warm_up' | 'play' | 'burst' | 'rest' | 'cool_down';

export type SessionItem = {
  kind: ItemKind;
  minutes: number;
  /** Minutes from the start of the session. */
  startMinute: number;
  /** 1-based playing block this item belongs to or follows (gates). */
  block?: number;
  tier?: Tier | null;
  gate?: { position: GatePosition; afterBlock?: number };
};

export type DaySession = {
  index: number;
  startTime: string;
  /** The start as an instant (ISO, UTC), computed in the plan's time zone. */
  startsAt: string;
  playingMinutes: number;
  items: SessionItem[];
};

export type DayKind = 'before_start' | 'rest' | 'playing' | 'taper' | 'event' | 'stopped';

export type DayProgramme = {
  date: string;
  kind: DayKind;
  stageIndex: number | null;
  playingMinutes: number;
  sessions: DaySession[];
  notes: string[];
};

/** What the day's programme depends on: the plan as built, or the progression state. */
export type PlanView = {
  periods: { stageIndex: number; startDate: string; endDate: string }[];
  stoppedSince?: string | null;
  sessionEndedOn?: string | null;
};

function split(total: number, parts: number): number[] {
  const base = Math.floor(total / parts);
  return Array.from({ length: parts }, (_, i) => base + (i < total % parts ? 1 : 0));
}

/** Bursts of demanding passages inside a block, each between stretches of easy material. */
function blockSegments(settings: PlanSettings, minutes: number, bursts: boolean): { kind: 'play' | 'burst'; minutes: number }[] {
  const b = settings.maxBurstMinutes;
  const e = settings.easyBetweenBurstsMinutes;
  const k = bursts ? Math.max(0, Math.floor((minutes - e) / (b + e))) : 0;
  const out: { kind: 'play' | 'burst'; minutes: number }[] = [];
  for (let i = 0; i < k; i += 1) out.push({ kind: 'play', minutes: e }, { kind: 'burst', minutes: b });
  out.push({ kind: 'play', minutes: minutes - k * (b + e) });
  return out;
}

function buildSession(settings: PlanSettings, level: Level, minutes: number, bursts: boolean): SessionItem[] {
  const items: SessionItem[] = [];
  let at = 0;
  const push = (item: Omit<SessionItem, 'startMinute'>) => {
    items.push({ ...item, startMinute: at });
    at += item.minutes;
  };
  push({ kind: 'gate', minutes: 0, gate: { position: 'before' } });
  if (settings.warmUpMinutes > 0) push({ kind: 'warm_up', minutes: settings.warmUpMinutes });
  const blocks = split(minutes, Math.ceil(minutes / level.blockMinutes));
  blocks.forEach((length, i) => {
    const block = i + 1;
    for (const seg of blockSegments(settings, length, bursts)) push({ ...seg, block, tier: level.highestTier });
    const last = block === blocks.length;
    push({ kind: 'gate', minutes: 0, block, gate: { position: last ? 'after' : 'between', afterBlock: block } });
    if (!last) push({ kind: 'rest', minutes: level.restMinutes, block });
  });
  if (settings.coolDownMinutes > 0) push({ kind: 'cool_down', minutes: settings.coolDownMinutes });
  return items;
}

function dayKind(settings: PlanSettings, date: string): 'playing' | 'taper' | 'event' {
  if (date === settings.event.date) return 'event';
  if (date < settings.event.date && date >= addDays(settings.event.date, -settings.taperDays)) return 'taper';
  return 'playing';
}

/** The day's programme from a ladder already built (used in loops over many days). */
export function programmeFor(settings: PlanSettings, ladder: Level[], view: PlanView, date: string): DayProgramme {
  const empty = (kind: DayKind, notes: string[] = []): DayProgramme => ({
    date, kind, stageIndex: period ? period.stageIndex : null, playingMinutes: 0, sessions: [], notes,
  });
  const period = date < settings.startDate ? undefined : periodOn(view.periods, date);
  if (!period) return empty('before_start');
  if (view.stoppedSince && date >= view.stoppedSince)
    return empty('stopped', ['Playing is stopped after a red-flag answer until a clinician has reviewed it.']);
  if (isRestDay(settings, toDay(date))) return empty('rest', ['Rest day: no playing.']);
  const level = ladder[period.stageIndex];
  if (!level) return empty('before_start');
  const kind = dayKind(settings, date);
  const light = kind !== 'playing';
  const total = light ? Math.max(1, Math.round((level.minutesPerDay * settings.taperPercent) / 100)) : level.minutesPerDay;
  const count = Math.min(level.sessionsPerDay, Math.ceil(total / settings.maxSessionMinutes));
  const sessions = split(total, count).map((minutes, index): DaySession => {
    const startTime = settings.sessionTimes[index] ?? settings.sessionTimes[settings.sessionTimes.length - 1] ?? '10:00';
    return {
      index,
      startTime,
      startsAt: instantOf(date, startTime, settings.timeZone),
      playingMinutes: minutes,
      items: buildSession(settings, level, minutes, level.passagesCleared && !light),
    };
  });
  const notes: string[] = [];
  if (light) notes.push('Lighter day before the event: no heavy practice (Horvath, Playing (Less) Hurt).');
  if (view.sessionEndedOn === date) notes.push('A pain gate failed today: stop playing for today.');
  return { date, kind, stageIndex: period.stageIndex, playingMinutes: total, sessions, notes };
}

/**
 * The sessions of one date: ordered items (gates, warm-up, play, bursts, rests, cool-down).
 * `state` is a progression state (or any PlanView); without it the plan as built is used.
 */
export function sessionsForDate(settings: PlanSettings, state: PlanView | null | undefined, date: string): DayProgramme {
  const view = state ?? { periods: buildStages(settings).map((s) => ({ stageIndex: s.index, startDate: s.startDate, endDate: s.endDate })) };
  return programmeFor(settings, buildLadder(settings), view, date);
}

/** Every day's programme from `from` to `to` inclusive (for calendars and charts). */
export function sessionsForRange(settings: PlanSettings, state: PlanView | null | undefined, from: string, to: string): DayProgramme[] {
  const ladder = buildLadder(settings);
  const view = state ?? { periods: buildStages(settings).map((s) => ({ stageIndex: s.index, startDate: s.startDate, endDate: s.endDate })) };
  const out: DayProgramme[] = [];
  for (let d = from; d <= to; d = addDays(d, 1)) out.push(programmeFor(settings, ladder, view, d));
  return out;
}
