import type { Piece } from '../schemas/piece';
import type { PlanSettings } from '../schemas/plan-settings';
import { addDays, daysBetween } from './dates';
import { clearanceAt, dateOfStage, passagesUnlock, tierUnlock } from './clearance';
import { buildLadder, type Level } from './ladder';
import { buildStages, periodOn, type StagePeriod } from './stages';
import type { Tier } from '../schemas/piece';

export type ReducedProgramme = {
  /** Programme pieces cleared, with their passages, by the last full day before the taper. */
  ready: Piece[];
  /** Programme pieces cleared but whose demanding passages are not. */
  withoutPassages: Piece[];
  /** Programme pieces not cleared in time. */
  notReady: Piece[];
};

export type Feasibility = {
  feasible: boolean;
  eventDate: string;
  /** Last full day before the taper: the target must be reached by then. */
  readyBy: string;
  targetMinutesPerDay: number;
  /** Earliest date the target minutes per day are planned, under the caps. */
  targetReachedOn: string;
  /** Earliest date every programme piece and its passages are cleared (null: no programme). */
  programmeClearedOn: string | null;
  /** How many days too late the plan is (0 when feasible). */
  daysShort: number;
  /** The highest minutes per day and tier planned by `readyBy`. */
  minutesReachable: number;
  tierReachable: Tier | null;
  reducedProgramme: ReducedProgramme;
  /** The earliest event date that would be feasible with these settings. */
  earliestFeasibleEventDate: string;
  message: string;
};

type Period = Pick<StagePeriod, 'stageIndex' | 'startDate' | 'endDate'>;

function latest(dates: (string | null)[]): string | null {
  return dates.reduce<string | null>((a, b) => (b !== null && (a === null || b > a) ? b : a), null);
}

/** Feasibility of a ladder placed on the calendar (the plan as built, or as re-projected). */
export function feasibilityOf(
  settings: PlanSettings,
  ladder: Level[],
  periods: Period[],
  pieces: Piece[],
  confirmedEarliestEventDate?: string,
): Feasibility {
  const readyBy = addDays(settings.event.date, -settings.taperDays - 1);
  const targetIndex = ladder.findIndex((l) => l.minutesPerDay >= settings.targetMinutesPerDay);
  const targetReachedOn = dateOfStage(periods, targetIndex + 1) ?? settings.event.date;
  const programme = pieces.filter((p) => p.onProgramme);
  const programmeClearedOn = latest(
    programme.map((p) => dateOfStage(periods, passagesUnlock(settings, p) ?? tierUnlock(settings, p.tier))),
  );
  const doneBy = latest([targetReachedOn, programmeClearedOn]) ?? targetReachedOn;
  const daysShort = Math.max(0, daysBetween(readyBy, doneBy));
  const atReady = periodOn(periods, readyBy);
  const level = atReady && readyBy >= settings.startDate ? ladder[atReady.stageIndex] : ladder[0];
  const stageNumber = level ? level.number : 1;
  const clearances = clearanceAt(settings, stageNumber, programme, periods);
  const reducedProgramme: ReducedProgramme = {
    ready: clearances.filter((c) => c.cleared && (c.passagesFromStage === null || c.passagesCleared)).map((c) => c.piece),
    withoutPassages: clearances.filter((c) => c.cleared && c.passagesFromStage !== null && !c.passagesCleared).map((c) => c.piece),
    notReady: clearances.filter((c) => !c.cleared).map((c) => c.piece),
  };
  const feasible = daysShort === 0;
  const minutesReachable = level ? level.minutesPerDay : settings.startMinutesPerDay;
  const earliestFeasibleEventDate = feasible
    ? settings.event.date
    : (confirmedEarliestEventDate ?? addDays(doneBy, settings.taperDays + 1));
  return {
    feasible,
    eventDate: settings.event.date,
    readyBy,
    targetMinutesPerDay: settings.targetMinutesPerDay,
    targetReachedOn,
    programmeClearedOn,
    daysShort,
    minutesReachable,
    tierReachable: level ? level.highestTier : null,
    reducedProgramme,
    earliestFeasibleEventDate,
    message: feasible
      ? `On the current plan the target of ${settings.targetMinutesPerDay} minutes a day is reached on ${targetReachedOn}, in time for ${settings.event.name} on ${settings.event.date}.`
      : `On the current plan the target is not reached in time for ${settings.event.name}: ${daysShort} days short. ` +
        `By ${readyBy} the plan reaches ${minutesReachable} minutes a day; ` +
        (programme.length > 0
          ? `${reducedProgramme.ready.length} of ${programme.length} programme pieces would be fully cleared. `
          : '') +
        `Options for the clinician: a reduced programme, a shorter target (${minutesReachable} minutes a day), ` +
        `or an event on or after ${earliestFeasibleEventDate}. The caps are not compressed.`,
  };
}

/** Feasibility of the plan as built from its settings, before any check-in. */
export function assessFeasibility(settings: PlanSettings, pieces: Piece[]): Feasibility {
  const estimate = feasibilityAsBuilt(settings, pieces);
  if (estimate.feasible) return estimate;
  return feasibilityAsBuilt(settings, pieces, earliestEventDate(settings, pieces, estimate.earliestFeasibleEventDate));
}

function feasibilityAsBuilt(settings: PlanSettings, pieces: Piece[], confirmedEarliestEventDate?: string): Feasibility {
  const ladder = buildLadder(settings);
  const periods = buildStages(settings).map((s) => ({ stageIndex: s.index, startDate: s.startDate, endDate: s.endDate }));
  return feasibilityOf(settings, ladder, periods, pieces, confirmedEarliestEventDate);
}

// The estimate reads this plan's calendar, but the calendar moves with the event (its rest days and
// taper), so it can be a day or so out. It is confirmed by building the plan for each candidate date,
// stepping back while the day before also works and forward until one does.
const SEARCH_DAYS = 28;

function earliestEventDate(settings: PlanSettings, pieces: Piece[], estimate: string): string {
  const feasibleOn = (date: string) => feasibilityAsBuilt({ ...settings, event: { ...settings.event, date } }, pieces).feasible;
  let date = estimate;
  if (feasibleOn(date)) {
    for (let i = 0; i < SEARCH_DAYS && feasibleOn(addDays(date, -1)); i++) date = addDays(date, -1);
    return date;
  }
  for (let i = 0; i < SEARCH_DAYS; i++) {
    date = addDays(date, 1);
    if (feasibleOn(date)) return date;
  }
  return estimate;
}
