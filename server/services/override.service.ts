import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { planSummary, planToday, progressionState } from '../../shared/scheduler';
import type { Override, OverrideAction } from '../../shared/schemas/override';
import type { OverrideRecord, OverrideRequest, OverrideResult, PlanState } from '../../shared/schemas/plan';
import { PlanSettingsSchema } from '../../shared/schemas/plan-settings';
import type { Db } from '../db/client';
import { planOverrides, user } from '../db/schema';
import { HttpError } from '../lib/http-error';
import { audit } from './audit';
import { activePlanOf } from './chart.service';
import { toOverview } from './plan-overview';

const toRecord = (o: Override): OverrideRecord => ({ id: o.id ?? '', action: o.action, date: o.date, reason: o.reason, by: o.by, at: o.at });

/** The active plan as it stands today: the engine's state with its explained history and the overrides. */
export function planState(db: Db, clinicianId: string, musicianId: string, now: Date): PlanState {
  const loaded = activePlanOf(db, clinicianId, musicianId);
  const state = progressionState({ ...loaded, today: now });
  const summary = planSummary({ ...loaded, today: now });
  const author = db.select({ name: user.name }).from(user).where(eq(user.id, loaded.plan.createdById)).get();
  return {
    plan: {
      id: loaded.plan.id,
      version: loaded.plan.version,
      status: loaded.plan.status,
      settings: PlanSettingsSchema.parse(loaded.plan.settings),
      createdBy: author?.name ?? '',
      createdAt: loaded.plan.createdAt.toISOString(),
      activatedAt: loaded.plan.activatedAt?.toISOString() ?? null,
    },
    overview: toOverview(loaded.plan, summary),
    cleanDays: state.cleanDays,
    periods: state.periods,
    feasibility: state.feasibility,
    history: state.history,
    prompts: summary.prompts,
    overrides: loaded.overrides.map(toRecord).reverse(),
  };
}

export function listOverrides(db: Db, clinicianId: string, musicianId: string): OverrideRecord[] {
  return activePlanOf(db, clinicianId, musicianId).overrides.map(toRecord).reverse();
}

const NO_EFFECT: Record<OverrideAction, string> = {
  advance: 'There is no later stage to move up to.',
  hold: 'Progression is already held.',
  resume: 'Progression is not held by a clinician, so there is nothing to resume.',
  step_back: 'The plan is already at its first stage.',
  clear_red_flag: 'No red flag is active.',
};

const clinicianEvents = (history: { by?: string }[]) => history.filter((event) => event.by !== undefined).length;

/**
 * Records a clinician's override after checking with the engine that it changes something (an override
 * the engine would ignore is refused with 409, so the record never shows a decision that did nothing).
 * It takes effect the day after `date`, as the engine replays it.
 */
export function recordOverride(
  db: Db, clinician: { id: string; name: string }, musicianId: string, request: OverrideRequest, now: Date,
): OverrideResult {
  const loaded = activePlanOf(db, clinician.id, musicianId);
  const today = planToday(now, loaded.settings.timeZone);
  const date = request.date ?? today;
  if (date > today) throw new HttpError(422, 'future_date', `An override cannot be dated after today (${today}).`);
  if (date < loaded.settings.startDate) {
    throw new HttpError(422, 'before_plan', `An override cannot be dated before the plan starts (${loaded.settings.startDate}).`);
  }
  const override: Override = { id: randomUUID(), action: request.action, date, reason: request.reason, by: clinician.name, at: now.toISOString() };
  const before = progressionState({ ...loaded, today: now });
  const after = progressionState({ ...loaded, overrides: [...loaded.overrides, override], today: now });
  if (clinicianEvents(after.history) <= clinicianEvents(before.history)) {
    throw new HttpError(409, 'no_effect', NO_EFFECT[request.action]);
  }
  db.transaction((tx) => {
    tx.insert(planOverrides)
      .values({ id: override.id ?? '', musicianId, action: override.action, date, reason: override.reason, byUserId: clinician.id, at: now })
      .run();
    audit(tx, { actorId: clinician.id, action: `override.${override.action}`, musicianId, detail: { overrideId: override.id, date, reason: override.reason }, at: now });
  });
  return { override: toRecord(override), state: planState(db, clinician.id, musicianId, now) };
}
