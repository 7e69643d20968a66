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

function item(
  kind: ItemKind,
  minutes: number,
  startMinute: number,
  block?: number,
  tier?: Tier | null,
  gate?: SessionItem['gate'],
): SessionItem {
  // One object shape for every item keeps long ranges (calendars, benches) fast.
  return { kind, minutes, startMinute, block, tier, gate };
}

/**
 * One session: a gate before it, warm-up, blocks no longer than the stage allows, a gate after every
 * block, a rest between blocks, cool-down. With passages cleared, each block interleaves bursts of
 * demanding passages (at most `maxBurstMinutes`) between stretches of easy material.
 */
function buildSession(settings: PlanSettings, level: Level, minutes: number, bursts: boolean): SessionItem[] {
  const items: SessionItem[] = [item('gate', 0, 0, undefined, undefined, { position: 'before' })];
  let at = 0;
  if (settings.warmUpMinutes > 0) {
    items.push(item('warm_up', settings.warmUpMinutes, at));
    at += settings.warmUpMinutes;
  }
  const b = settings.maxBurstMinutes;
  const e = settings.easyBetweenBurstsMinutes;
  const blocks = split(minutes, Math.ceil(minutes / level.blockMinutes));
  for (let i = 0; i < blocks.length; i += 1) {
    const length = blocks[i] ?? 0;
    const block = i + 1;
    const k = bursts ? Math.max(0, Math.floor((length - e) / (b + e))) : 0;
    for (let j = 0; j < k; j += 1) {
      items.push(item('play', e, at, block, level.highestTier));
      items.push(item('burst', b, at + e, block, level.highestTier));
      at += e + b;
    }
    const easy = length - k * (b + e);
    items.push(item('play', easy, at, block, level.highestTier));
    at += easy;
    const last = block === blocks.length;
    items.push(item('gate', 0, at, block, undefined, { position: last ? 'after' : 'between', afterBlock: block }));
    if (!last) {
      items.push(item('rest', level.restMinutes, at, block));
      at += level.restMinutes;
    }
  }
  if (settings.coolDownMinutes > 0) items.push(item('cool_down', settings.coolDownMinutes, at));
  return items;
}

function dayKind(settings: PlanSettings, date: string): 'playing' | 'taper' | 'event' {
  if (date === settings.event.date) return 'event';
  if (date < settings.event.date && date >= addDays(settings.event.date, -settings.taperDays)) return 'taper';
  return 'playing';
}

/** A playing day's minutes and how many sessions they are split into: fewer on the lighter days before the event. */
function dayShape(settings: PlanSettings, level: Level, date: string) {
  const kind = dayKind(settings, date);
  const light = kind !== 'playing';
  const total = light ? Math.max(1, Math.round((level.minutesPerDay * settings.taperPercent) / 100)) : level.minutesPerDay;
  return { kind, light, total, count: Math.min(level.sessionsPerDay, Math.ceil(total / settings.maxSessionMinutes)) };
}

/** How many sessions a playing day at this level holds (what a full day of playing means). */
export function sessionsPlannedOn(settings: PlanSettings, level: Level, date: string): number {
  return dayShape(settings, level, date).count;
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
  const { kind, light, total, count } = dayShape(settings, level, date);
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
