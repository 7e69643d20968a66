import type { PieceClearanceView, Readiness, StudentClearance } from '../schemas/clearance';
import type { PlanSummary } from './summary';

/** Readiness words for a teacher (see ReadinessSchema): stopped playing is "paused". */
export function readinessOf(summary: Pick<PlanSummary, 'status' | 'feasible'>): Readiness {
  if (summary.status === 'stopped') return 'paused';
  if (summary.status === 'held' || summary.status === 'stepped_back' || !summary.feasible) return 'delayed';
  return 'on_track';
}

/**
 * The teacher's view of a plan, derived from the engine's summary and nothing else, so it is never
 * typed twice. It carries limits and repertoire only: no pain, check-ins, notes, history or reasons.
 * While playing is stopped nothing is cleared and no date is promised.
 */
export function teacherClearance(
  student: { id: string; name: string; instrument: string },
  summary: PlanSummary,
): StudentClearance {
  const stopped = summary.status === 'stopped';
  const pieces: PieceClearanceView[] = summary.repertoire.map((entry) => ({
    title: entry.piece.title,
    composer: entry.piece.composer,
    tier: entry.piece.tier,
    onProgramme: entry.piece.onProgramme,
    cleared: !stopped && entry.cleared,
    expectedOn: stopped || entry.cleared ? null : entry.expectedOn,
    passages: entry.piece.passages.map((passage) => ({
      bars: passage.bars,
      demands: passage.demands,
      cleared: !stopped && entry.passagesCleared,
      expectedOn: stopped || entry.passagesCleared ? null : entry.passagesExpectedOn,
    })),
  }));
  const programme = pieces.filter((piece) => piece.onProgramme);
  return {
    // Named one by one, so a caller passing a whole record cannot leak more than these into the view.
    id: student.id,
    name: student.name,
    instrument: student.instrument,
    asOf: summary.today,
    readiness: readinessOf(summary),
    event: summary.event,
    limits: {
      minutesPerDay: summary.minutesPerDay,
      longestBlockMinutes: summary.longestBlockMinutes,
      restMinutes: stopped ? 0 : summary.restMinutes,
      sessionsPerDay: stopped ? 0 : summary.sessionsPerDay,
    },
    pieces,
    programme: {
      total: programme.length,
      cleared: programme.filter((piece) => piece.cleared).length,
      fullyCleared: programme.filter((piece) => piece.cleared && piece.passages.every((p) => p.cleared)).length,
    },
  };
}

/** What must change for a teacher to be told: limits and cleared repertoire, not projected dates. */
export function clearanceFingerprint(view: StudentClearance): string {
  return JSON.stringify([
    view.readiness,
    view.limits,
    view.pieces.map((piece) => [piece.title, piece.cleared, piece.passages.map((p) => p.cleared)]),
  ]);
}
