import type { CheckIn } from '../schemas/check-in';
import type { Override } from '../schemas/override';
import type { Piece, Tier } from '../schemas/piece';
import type { PlanSettings } from '../schemas/plan-settings';
import { clearanceAt, type PieceClearance } from './clearance';
import { daysBetween } from './dates';
import type { ProgressionStatus } from './history';
import { loadReport, type LoadWarning } from './load';
import { progressionState, type ProgressionState } from './progression';

export type PlanSummaryInput = {
  settings: PlanSettings;
  checkIns: CheckIn[];
  overrides: Override[];
  pieces: Piece[];
  today: string | Date;
};

/** What a landing screen needs about one plan, today. */
export type PlanSummary = {
  today: string;
  stageNumber: number;
  stageCount: number;
  status: ProgressionStatus;
  minutesPerDay: number;
  sessionsPerDay: number;
  longestBlockMinutes: number;
  restMinutes: number;
  highestTier: Tier | null;
  passagesCleared: boolean;
  /** Start of the next stage as now projected (null at the last stage). */
  nextStageStartDate: string | null;
  event: { name: string; date: string };
  /** Negative once the event has passed. */
  daysToEvent: number;
  feasible: boolean;
  targetReachedOn: string;
  daysShort: number;
  redFlagActive: boolean;
  repertoire: PieceClearance[];
  loadWarning: LoadWarning;
  /** The latest change, explained. */
  lastChange: string | null;
  prompts: string[];
};

/** `state` may be passed when the caller already ran the engine on the same input (the replay is the cost). */
export function planSummary(input: PlanSummaryInput, state: ProgressionState = progressionState(input)): PlanSummary {
  const { settings } = input;
  const { stage } = state;
  const next = state.periods.find((p) => p.kind === 'projected' && p.startDate > state.today);
  const load = loadReport(input.checkIns, settings.startDate, state.today);
  return {
    today: state.today,
    stageNumber: state.stageNumber,
    stageCount: state.stageCount,
    status: state.status,
    minutesPerDay: state.status === 'stopped' ? 0 : stage.minutesPerDay,
    sessionsPerDay: stage.sessionsPerDay,
    longestBlockMinutes: state.status === 'stopped' ? 0 : stage.blockMinutes,
    restMinutes: stage.restMinutes,
    highestTier: state.status === 'stopped' ? null : stage.highestTier,
    passagesCleared: state.status !== 'stopped' && stage.passagesCleared,
    nextStageStartDate: next ? next.startDate : null,
    event: { name: settings.event.name, date: settings.event.date },
    daysToEvent: daysBetween(state.today, settings.event.date),
    feasible: state.feasibility.feasible,
    targetReachedOn: state.feasibility.targetReachedOn,
    daysShort: state.feasibility.daysShort,
    redFlagActive: state.stoppedSince !== null,
    repertoire: clearanceAt(settings, state.status === 'stopped' ? 0 : state.stageNumber, input.pieces, state.periods, state.today),
    loadWarning: load.warning,
    lastChange: state.history.at(-1)?.message ?? null,
    prompts: [...state.prompts, ...(load.warning.message ? [load.warning.message] : [])],
  };
}
