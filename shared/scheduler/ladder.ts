import type { PlanSettings } from '../schemas/plan-settings';
import type { Tier } from '../schemas/piece';

export type LevelBasis = 'published' | 'rule';

/** One rung of the progression, before it is placed on the calendar. */
export type Level = {
  /** 0-based position in the ladder. */
  index: number;
  /** 1-based stage number shown to people. */
  number: number;
  minutesPerDay: number;
  sessionsPerDay: number;
  /** Longest continuous playing block. */
  blockMinutes: number;
  /** Rest between blocks. */
  restMinutes: number;
  /** Highest repertoire tier cleared; null = no repertoire yet (simple exercises only). */
  highestTier: Tier | null;
  /** Demanding passages of cleared pieces may be played, in short bursts. */
  passagesCleared: boolean;
  /** "published": copied from a published table; "rule": Ritorno's own progression rule. */
  basis: LevelBasis;
  source: string;
};

export const RULE_SOURCE =
  'Ritorno progression rule: step and growth caps set by the clinician; block and rest interpolated from start to target';

/** Growth from one level to the next under both caps, in whole minutes. */
export function nextMinutes(settings: PlanSettings, minutes: number): number {
  const cap = Math.min(settings.maxStageGrowthPercent, settings.maxWeeklyGrowthPercent);
  const byCap = minutes + Math.floor((minutes * cap) / 100 + 1e-9);
  return Math.min(settings.targetMinutesPerDay, minutes + settings.stepMinutes, byCap);
}

export function tierAtStage(settings: PlanSettings, stageNumber: number): Tier | null {
  const t = settings.tierUnlockStage;
  if (stageNumber >= t.demanding) return 'demanding';
  if (stageNumber >= t.moderate) return 'moderate';
  if (stageNumber >= t.easy) return 'easy';
  return null;
}

/** The stage number at which everything (all tiers and passages) is cleared. */
export function finalUnlockStage(settings: PlanSettings): number {
  const t = settings.tierUnlockStage;
  return Math.max(t.easy, t.moderate, t.demanding, settings.passagesUnlockStage);
}

function sessionsFor(settings: PlanSettings, minutesPerDay: number): number {
  return Math.min(settings.maxSessionsPerDay, Math.ceil(minutesPerDay / settings.maxSessionMinutes));
}

type Anchor = { minutes: number; block: number; rest: number };

function interpolate(settings: PlanSettings, a: Anchor, minutes: number): { block: number; rest: number } {
  const span = settings.targetMinutesPerDay - a.minutes;
  const f = span <= 0 ? 1 : (minutes - a.minutes) / span;
  const block = Math.max(1, Math.round(a.block + f * (settings.targetBlockMinutes - a.block)));
  const rest = Math.round(a.rest + f * (settings.targetRestMinutes - a.rest));
  // At least 10 minutes of rest per hour of playing (Klickstein 2009, p. 75): rest >= block / 5.
  return { block, rest: Math.max(rest, Math.ceil(block / 5)) };
}

/**
 * The ladder of levels from the minutes tolerated now to the target: fixed (published) levels first,
 * then steps of `stepMinutes` limited by both growth caps, then stages at the target until every tier
 * and the demanding passages are cleared (duration first, difficulty last: Norris 1996).
 */
export function buildLadder(settings: PlanSettings): Level[] {
  const rows: { minutes: number; block: number; rest: number; basis: LevelBasis; source: string }[] =
    settings.fixedLevels.map((f) => ({
      minutes: f.minutesPerDay,
      block: f.blockMinutes,
      rest: f.restMinutes,
      basis: 'published',
      source: f.source,
    }));
  const last = rows[rows.length - 1];
  const anchor: Anchor = last
    ? { minutes: last.minutes, block: last.block, rest: last.rest }
    : { minutes: settings.startMinutesPerDay, block: settings.startBlockMinutes, rest: settings.startRestMinutes };
  let minutes = last ? last.minutes : settings.startMinutesPerDay;
  if (!last) rows.push({ minutes, ...interpolate(settings, anchor, minutes), basis: 'rule', source: RULE_SOURCE });
  while (minutes < settings.targetMinutesPerDay) {
    minutes = nextMinutes(settings, minutes);
    rows.push({ minutes, ...interpolate(settings, anchor, minutes), basis: 'rule', source: RULE_SOURCE });
  }
  while (rows.length < finalUnlockStage(settings)) {
    rows.push({ minutes, ...interpolate(settings, anchor, minutes), basis: 'rule', source: RULE_SOURCE });
  }
  return rows.map((row, index) => {
    const sessionsPerDay = sessionsFor(settings, row.minutes);
    const perSession = Math.ceil(row.minutes / sessionsPerDay);
    return {
      index,
      number: index + 1,
      minutesPerDay: row.minutes,
      sessionsPerDay,
      blockMinutes: Math.min(row.block, perSession),
      restMinutes: row.rest,
      highestTier: tierAtStage(settings, index + 1),
      passagesCleared: index + 1 >= settings.passagesUnlockStage,
      basis: row.basis,
      source: row.source,
    };
  });
}
