import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { planSummary, progressionState, type PlanSummary, type ProgressionState } from '../../shared/scheduler';
import type { PlanOverview } from '../../shared/schemas/plan-overview';
import type { CheckIn } from '../../shared/schemas/check-in';
import type { Db } from '../db/client';
import { checkIns } from '../db/schema';
import { HttpError, notFound } from '../lib/http-error';
import type { Mailer } from '../lib/mailer';
import type { CheckInResult, CheckInUpload } from '../../shared/schemas/today';
import { alertClinician } from './alert.service';
import { syncClearanceNotices } from './clearance-notice.service';
import { loadActivePlan } from './plan.service';
import { toOverview } from './plan-overview';

export interface RecordedCheckIn {
  id: string;
  duplicate: boolean;
  checkIn: CheckIn;
  before: ProgressionState;
  after: ProgressionState;
  painThreshold: { session: number; nextMorning: number };
  /** The plan after this check-in, summarised from `after` (no second replay). */
  overview: PlanOverview;
  summary: PlanSummary;
}

/** Pain over the plan's threshold in any gate, or on the next morning. */
export function overThreshold(checkIn: CheckIn, threshold: { session: number; nextMorning: number }): boolean {
  if (checkIn.kind === 'next_morning') return checkIn.pain > threshold.nextMorning;
  if (checkIn.kind === 'pain_report') return checkIn.pain > threshold.session;
  return checkIn.gates.some((gate) => gate.pain > threshold.session);
}

/**
 * Saves a check-in once: a retry with the same client key returns the first one unchanged.
 * Returns the progression before and after, so callers can tell what changed.
 */
export function recordCheckIn(db: Db, musicianId: string, clientKey: string, checkIn: CheckIn, now: Date): RecordedCheckIn {
  const loaded = loadActivePlan(db, musicianId);
  if (!loaded) throw notFound('Active plan');
  const before = progressionState({ ...loaded, today: now });
  const existing = db
    .select()
    .from(checkIns)
    .where(and(eq(checkIns.musicianId, musicianId), eq(checkIns.clientKey, clientKey)))
    .get();
  const painThreshold = loaded.settings.painThreshold;
  const summarise = (all: CheckIn[], state: ProgressionState) => {
    const summary = planSummary({ ...loaded, checkIns: all, today: now }, state);
    return { summary, overview: toOverview(loaded.plan, summary) };
  };
  if (existing) {
    return { id: existing.id, duplicate: true, checkIn: existing.payload, before, after: before, painThreshold, ...summarise(loaded.checkIns, before) };
  }

  if (checkIn.date > before.today) {
    throw new HttpError(422, 'future_date', `A check-in cannot be dated after today (${before.today}).`);
  }
  if (checkIn.date < loaded.settings.startDate) {
    throw new HttpError(422, 'before_plan', `A check-in cannot be dated before the plan starts (${loaded.settings.startDate}).`);
  }
  const id = randomUUID();
  const stored: CheckIn = { ...checkIn, id, recordedAt: now.toISOString() };
  db.insert(checkIns)
    .values({ id, musicianId, date: checkIn.date, kind: checkIn.kind, payload: stored, clientKey, recordedAt: now })
    .run();
  const all = [...loaded.checkIns, stored];
  const after = progressionState({ ...loaded, checkIns: all, today: now });
  return { id, duplicate: false, checkIn: stored, before, after, painThreshold, ...summarise(all, after) };
}

/**
 * Records a check-in and, when it reports pain over the threshold or a red flag, alerts the clinician
 * (after the write: a mail failure never loses the check-in).
 */
export async function submitCheckIn(
  deps: { db: Db; mailer: Mailer; publicUrl: string },
  musicianId: string,
  upload: CheckInUpload,
  now: Date,
): Promise<CheckInResult> {
  const { db } = deps;
  const recorded = recordCheckIn(db, musicianId, upload.clientKey, upload.checkIn, now);
  const over = overThreshold(recorded.checkIn, recorded.painThreshold);
  const change = recorded.after.history.slice(recorded.before.history.length).at(-1)?.message ?? null;
  let clinicianNotified = false;
  try {
    clinicianNotified = await alertClinician(
      { ...deps, now },
      { musicianId, checkInId: recorded.id, checkIn: recorded.checkIn, change, overThreshold: over },
    );
  } catch (error) {
    console.error('[mail] clinician alert not sent:', error);
  }
  try {
    await syncClearanceNotices(deps, musicianId, now, recorded.summary);
  } catch (error) {
    console.error('[mail] clearance notice not sent:', error);
  }
  const { overview } = recorded;
  return {
    id: recorded.id,
    duplicate: recorded.duplicate,
    overview,
    stopPlaying: over || recorded.checkIn.redFlags.length > 0,
    redFlag: recorded.checkIn.redFlags.length > 0,
    clinicianNotified,
    change,
  };
}

export function listCheckIns(db: Db, musicianId: string): CheckIn[] {
  const loaded = loadActivePlan(db, musicianId);
  return loaded ? [...loaded.checkIns].reverse() : [];
}
