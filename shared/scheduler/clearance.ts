import type { Piece, Tier } from '../schemas/piece';
import type { PlanSettings } from '../schemas/plan-settings';

export type PieceClearance = {
  piece: Piece;
  /** 1-based stage from which the piece may be played. */
  clearedFromStage: number;
  /** 1-based stage from which its demanding passages may be played (null: it has none). */
  passagesFromStage: number | null;
  cleared: boolean;
  passagesCleared: boolean;
  /** When the piece is expected to be cleared (its start date if already cleared). */
  expectedOn: string | null;
  passagesExpectedOn: string | null;
};

export function tierUnlock(settings: PlanSettings, tier: Tier): number {
  return settings.tierUnlockStage[tier];
}

/** Passages may come later than their piece, never earlier. */
export function passagesUnlock(settings: PlanSettings, piece: Piece): number | null {
  if (piece.passages.length === 0) return null;
  return Math.max(settings.passagesUnlockStage, tierUnlock(settings, piece.tier));
}

type Dated = { stageIndex: number; startDate: string };

/** First date at which the plan reaches a stage number (periods in date order). */
export function dateOfStage(periods: Dated[], stageNumber: number): string | null {
  const hit = periods.find((p) => p.stageIndex + 1 >= stageNumber);
  return hit ? hit.startDate : null;
}

/**
 * What repertoire is cleared at a stage, and when the rest is expected. The teacher view is derived
 * from this (it carries no medical detail).
 */
export function clearanceAt(
  settings: PlanSettings,
  stageNumber: number,
  pieces: Piece[],
  periods: (Dated & { endDate?: string })[],
  today?: string,
): PieceClearance[] {
  // What is not cleared now is expected from today on: after a step back, the date the plan first
  // reached a stage is history, not a projection.
  const ahead = today ? periods.filter((p) => (p.endDate ?? p.startDate) >= today) : periods;
  return pieces.map((piece) => {
    const clearedFromStage = tierUnlock(settings, piece.tier);
    const passagesFromStage = passagesUnlock(settings, piece);
    const cleared = stageNumber >= clearedFromStage;
    const passagesCleared = passagesFromStage !== null && stageNumber >= passagesFromStage;
    return {
      piece,
      clearedFromStage,
      passagesFromStage,
      cleared,
      passagesCleared,
      expectedOn: dateOfStage(cleared ? periods : ahead, clearedFromStage),
      passagesExpectedOn: passagesFromStage === null ? null : dateOfStage(passagesCleared ? periods : ahead, passagesFromStage),
    };
  });
}
