import { and, asc, eq, inArray } from 'drizzle-orm';
import type { CheckIn } from '../../shared/schemas/check-in';
import type { Override } from '../../shared/schemas/override';
import type { Piece } from '../../shared/schemas/piece';
import type { PlanOverview } from '../../shared/schemas/plan-overview';
import { PlanSettingsSchema } from '../../shared/schemas/plan-settings';
import { planSummary } from '../../shared/scheduler';
import type { Db } from '../db/client';
import { checkIns, pieces, planOverrides, plans, user } from '../db/schema';
import { toOverview } from './plan-overview';

/** Everything the engine needs about one musician's active plan, read from the database. */
export function loadActivePlan(db: Db, musicianId: string) {
  const plan = db
    .select()
    .from(plans)
    .where(and(eq(plans.musicianId, musicianId), eq(plans.status, 'active')))
    .get();
  if (!plan) return null;
  const settings = PlanSettingsSchema.parse(plan.settings);
  const reported: CheckIn[] = db
    .select({ payload: checkIns.payload })
    .from(checkIns)
    .where(eq(checkIns.musicianId, musicianId))
    .orderBy(asc(checkIns.date), asc(checkIns.recordedAt))
    .all()
    .map((row) => row.payload);
  const overrides: Override[] = db
    .select({ override: planOverrides, by: user.name })
    .from(planOverrides)
    .innerJoin(user, eq(user.id, planOverrides.byUserId))
    .where(eq(planOverrides.musicianId, musicianId))
    .orderBy(asc(planOverrides.at))
    .all()
    .map(({ override, by }) => ({
      id: override.id,
      action: override.action,
      date: override.date,
      reason: override.reason,
      by,
      at: override.at.toISOString(),
    }));
  const repertoire = loadPieces(db, musicianId);
  return { plan, settings, checkIns: reported, overrides, pieces: repertoire };
}

/** The musician's repertoire as the engine reads it, by title. */
export function loadPieces(db: Db, musicianId: string): Piece[] {
  return db
    .select()
    .from(pieces)
    .where(eq(pieces.musicianId, musicianId))
    .orderBy(asc(pieces.title))
    .all()
    .map((row) => ({
      id: row.id,
      title: row.title,
      composer: row.composer,
      tier: row.tier,
      passages: row.passages,
      onProgramme: row.onProgramme,
    }));
}

/** The active plan at a glance, as of `now` in the plan's own time zone; null without one. */
export function planOverview(db: Db, musicianId: string, now: Date): PlanOverview | null {
  const loaded = loadActivePlan(db, musicianId);
  if (!loaded) return null;
  return toOverview(loaded.plan, planSummary({ ...loaded, today: now }));
}

/** Overviews for several musicians at once (a caseload), keyed by musician id. */
export function planOverviews(db: Db, musicianIds: string[], now: Date): Map<string, PlanOverview> {
  const withPlans = musicianIds.length
    ? db
        .select({ musicianId: plans.musicianId })
        .from(plans)
        .where(and(inArray(plans.musicianId, musicianIds), eq(plans.status, 'active')))
        .all()
    : [];
  const out = new Map<string, PlanOverview>();
  for (const { musicianId } of withPlans) {
    const overview = planOverview(db, musicianId, now);
    if (overview) out.set(musicianId, overview);
  }
  return out;
}
