import { and, eq } from 'drizzle-orm';
import {
  buildLadder,
  clearanceAt,
  planSummary,
  progressionState,
  tierAtStage,
  type PlanSettings,
  type ProgressionState,
} from '../../shared/scheduler';
import type { MyPiece, MyPlan, MyPlanStage, NextUnlock } from '../../shared/schemas/my-plan';
import type { Piece } from '../../shared/schemas/piece';
import type { SetupReminder } from '../../shared/schemas/today';
import type { Db } from '../db/client';
import { setupItems } from '../db/schema';
import { notFound } from '../lib/http-error';
import { loadActivePlan } from './plan.service';
import { toOverview } from './plan-overview';

function activeSetup(db: Db, musicianId: string): SetupReminder[] {
  return db
    .select({ id: setupItems.id, label: setupItems.label, instructions: setupItems.instructions })
    .from(setupItems)
    .where(and(eq(setupItems.musicianId, musicianId), eq(setupItems.active, true)))
    .all();
}

function stagesOf(settings: PlanSettings, state: ProgressionState): MyPlanStage[] {
  const ladder = buildLadder(settings);
  return state.periods.flatMap((period): MyPlanStage[] => {
    const level = ladder[period.stageIndex];
    if (!level) return [];
    return [
      {
        stageNumber: level.number,
        startDate: period.startDate,
        endDate: period.endDate,
        kind: period.kind,
        current: period.startDate <= state.today && state.today <= period.endDate,
        minutesPerDay: level.minutesPerDay,
        sessionsPerDay: level.sessionsPerDay,
        blockMinutes: level.blockMinutes,
        restMinutes: level.restMinutes,
        highestTier: level.highestTier,
        passagesCleared: level.passagesCleared,
        basis: level.basis,
      },
    ];
  });
}

/**
 * The first stage above the current one that clears a new tier or the demanding passages, dated by the
 * engine's projection. While playing is stopped no date is promised.
 */
function nextUnlockOf(settings: PlanSettings, state: ProgressionState, pieces: Piece[], stages: MyPlanStage[]): NextUnlock | null {
  const ladder = buildLadder(settings);
  const current = ladder[state.stageIndex];
  if (!current) return null;
  const upcoming = ladder.slice(state.stageIndex + 1).find((level) => {
    const tier = tierAtStage(settings, level.number);
    return tier !== tierAtStage(settings, level.number - 1) || (level.passagesCleared && !current.passagesCleared);
  });
  if (!upcoming) return null;
  const tier = tierAtStage(settings, upcoming.number);
  const newTier = tier !== tierAtStage(settings, upcoming.number - 1) ? tier : null;
  const stopped = state.status === 'stopped';
  const projected = stages.find((stage) => stage.kind === 'projected' && stage.stageNumber >= upcoming.number);
  const before = clearanceAt(settings, state.stageNumber, pieces, []);
  const after = clearanceAt(settings, upcoming.number, pieces, []);
  return {
    stageNumber: upcoming.number,
    expectedOn: stopped ? null : (projected?.startDate ?? null),
    tier: newTier,
    passages: upcoming.passagesCleared && !current.passagesCleared,
    pieces: after.filter((entry, i) => entry.cleared && !before[i]?.cleared).map((entry) => entry.piece.title),
  };
}

function piecesOf(settings: PlanSettings, state: ProgressionState, pieces: Piece[]): MyPiece[] {
  const stopped = state.status === 'stopped';
  // Expected dates come from the projection only, so a stage already passed before a step back is not
  // offered as a date in the past.
  const projected = state.periods.filter((period) => period.kind === 'projected');
  return clearanceAt(settings, stopped ? 0 : state.stageNumber, pieces, projected).map((entry) => ({
    id: entry.piece.id ?? entry.piece.title,
    title: entry.piece.title,
    composer: entry.piece.composer,
    tier: entry.piece.tier,
    onProgramme: entry.piece.onProgramme,
    cleared: entry.cleared,
    expectedOn: stopped || entry.cleared ? null : entry.expectedOn,
    passages: entry.piece.passages.map((passage) => ({
      bars: passage.bars,
      demands: passage.demands,
      cleared: entry.passagesCleared,
      expectedOn: stopped || entry.passagesCleared ? null : entry.passagesExpectedOn,
    })),
  }));
}

/** The musician's own plan as of `now`: the engine's stages, position, next unlock and repertoire. */
export function myPlanFor(db: Db, musicianId: string, now: Date): MyPlan {
  const loaded = loadActivePlan(db, musicianId);
  if (!loaded) throw notFound('Active plan');
  const { settings } = loaded;
  const state = progressionState({ ...loaded, today: now });
  const summary = planSummary({ ...loaded, today: now });
  const stages = stagesOf(settings, state);
  return {
    overview: toOverview(loaded.plan, summary),
    stages,
    cleanDays: state.cleanDays,
    minDaysPerStage: settings.minDaysPerStage,
    nextUnlock: nextUnlockOf(settings, state, loaded.pieces, stages),
    event: { name: settings.event.name, date: settings.event.date },
    pieces: piecesOf(settings, state, loaded.pieces),
    setup: activeSetup(db, musicianId),
    changes: [...state.history].reverse().map((event) => ({ date: event.date, message: event.message })),
  };
}
