import { randomUUID } from 'node:crypto';
import { and, desc, eq, max } from 'drizzle-orm';
import { assessFeasibility, buildStages, publishedLevelsPreset } from '../../shared/scheduler';
import type { PlanPresets, PlanPreview, PlanVersion, PlanVersionDetail } from '../../shared/schemas/plan';
import { PlanSettingsSchema, type PlanSettings } from '../../shared/schemas/plan-settings';
import type { Db } from '../db/client';
import { plans, user } from '../db/schema';
import { HttpError, notFound } from '../lib/http-error';
import { audit } from './audit';
import { ownMusician } from './own-musician';
import { loadActivePlan, loadPieces } from './plan.service';

type PlanRow = typeof plans.$inferSelect;

function toVersion(row: PlanRow, createdBy: string): PlanVersion {
  return {
    id: row.id,
    version: row.version,
    status: row.status,
    settings: PlanSettingsSchema.parse(row.settings),
    createdBy,
    createdAt: row.createdAt.toISOString(),
    activatedAt: row.activatedAt?.toISOString() ?? null,
  };
}

/** The engine's defaults (all but the start date and the event) and the published-levels preset. */
export function planPresets(): PlanPresets {
  const { startDate: _start, event: _event, ...defaults } = PlanSettingsSchema.parse({
    startDate: '2000-01-03',
    event: { name: 'Event', date: '2000-12-31' },
  });
  return { defaults, presets: [publishedLevelsPreset] };
}

/** Stages and feasibility for settings and the musician's repertoire; nothing is saved. */
export function previewPlan(db: Db, clinicianId: string, musicianId: string, settings: PlanSettings): PlanPreview {
  ownMusician(db, clinicianId, musicianId);
  return { settings, stages: buildStages(settings), feasibility: assessFeasibility(settings, loadPieces(db, musicianId)) };
}

export function listVersions(db: Db, clinicianId: string, musicianId: string): PlanVersion[] {
  ownMusician(db, clinicianId, musicianId);
  return db
    .select({ plan: plans, by: user.name })
    .from(plans)
    .innerJoin(user, eq(user.id, plans.createdById))
    .where(eq(plans.musicianId, musicianId))
    .orderBy(desc(plans.version))
    .all()
    .map(({ plan, by }) => toVersion(plan, by));
}

function findVersion(db: Db, musicianId: string, planId: string) {
  const found = db
    .select({ plan: plans, by: user.name })
    .from(plans)
    .innerJoin(user, eq(user.id, plans.createdById))
    .where(and(eq(plans.id, planId), eq(plans.musicianId, musicianId)))
    .get();
  if (!found) throw notFound('Plan version');
  return found;
}

export function getVersion(db: Db, clinicianId: string, musicianId: string, planId: string): PlanVersionDetail {
  ownMusician(db, clinicianId, musicianId);
  const { plan, by } = findVersion(db, musicianId, planId);
  const version = toVersion(plan, by);
  return { ...version, preview: previewPlan(db, clinicianId, musicianId, version.settings) };
}

function insertDraft(db: Db, clinicianId: string, musicianId: string, settings: PlanSettings, now: Date, basedOn: string | null): string {
  const id = randomUUID();
  db.transaction((tx) => {
    const latest = tx.select({ v: max(plans.version) }).from(plans).where(eq(plans.musicianId, musicianId)).get();
    const version = (latest?.v ?? 0) + 1;
    tx.insert(plans).values({ id, musicianId, version, status: 'draft', settings, createdById: clinicianId, createdAt: now }).run();
    audit(tx, { actorId: clinicianId, action: 'plan.draft_created', musicianId, detail: { planId: id, version, basedOn }, at: now });
  });
  return id;
}

export function createDraft(db: Db, clinicianId: string, musicianId: string, settings: PlanSettings, now: Date): PlanVersion {
  ownMusician(db, clinicianId, musicianId);
  const id = insertDraft(db, clinicianId, musicianId, settings, now, null);
  const { plan, by } = findVersion(db, musicianId, id);
  return toVersion(plan, by);
}

/**
 * A draft is edited in place. Editing the active version writes a new draft version instead, so what
 * was prescribed when is never lost; it takes effect when activated. Superseded versions are history.
 */
export function editVersion(
  db: Db, clinicianId: string, musicianId: string, planId: string, settings: PlanSettings, now: Date,
): { version: PlanVersion; created: boolean } {
  ownMusician(db, clinicianId, musicianId);
  const { plan } = findVersion(db, musicianId, planId);
  if (plan.status === 'superseded') {
    throw new HttpError(409, 'superseded', 'This version has been replaced; edit the active version or a draft.');
  }
  let id = plan.id;
  if (plan.status === 'active') {
    id = insertDraft(db, clinicianId, musicianId, settings, now, plan.id);
  } else {
    db.transaction((tx) => {
      tx.update(plans).set({ settings }).where(eq(plans.id, plan.id)).run();
      audit(tx, { actorId: clinicianId, action: 'plan.draft_updated', musicianId, detail: { planId: plan.id, version: plan.version }, at: now });
    });
  }
  const saved = findVersion(db, musicianId, id);
  return { version: toVersion(saved.plan, saved.by), created: id !== plan.id };
}

export function deleteDraft(db: Db, clinicianId: string, musicianId: string, planId: string, now: Date): void {
  ownMusician(db, clinicianId, musicianId);
  const { plan } = findVersion(db, musicianId, planId);
  if (plan.status !== 'draft') throw new HttpError(409, 'not_a_draft', 'Only a draft can be deleted; active and past versions are kept.');
  db.transaction((tx) => {
    tx.delete(plans).where(eq(plans.id, plan.id)).run();
    audit(tx, { actorId: clinicianId, action: 'plan.draft_deleted', musicianId, detail: { planId: plan.id, version: plan.version }, at: now });
  });
}

/** Makes a draft the active version and supersedes the previous one, in one short transaction. */
export function activateDraft(
  db: Db, clinicianId: string, musicianId: string, planId: string, now: Date,
): { version: PlanVersion; supersededId: string | null } {
  ownMusician(db, clinicianId, musicianId);
  const { plan } = findVersion(db, musicianId, planId);
  if (plan.status !== 'draft') throw new HttpError(409, 'not_a_draft', `Version ${plan.version} is ${plan.status}; only a draft can be activated.`);
  const supersededId = db.transaction((tx) => {
    const previous = tx.select({ id: plans.id }).from(plans).where(and(eq(plans.musicianId, musicianId), eq(plans.status, 'active'))).get();
    if (previous) tx.update(plans).set({ status: 'superseded' }).where(eq(plans.id, previous.id)).run();
    tx.update(plans).set({ status: 'active', activatedAt: now }).where(eq(plans.id, plan.id)).run();
    audit(tx, { actorId: clinicianId, action: 'plan.activated', musicianId, detail: { planId: plan.id, version: plan.version, supersededId: previous?.id ?? null }, at: now });
    return previous?.id ?? null;
  });
  const saved = findVersion(db, musicianId, plan.id);
  return { version: toVersion(saved.plan, saved.by), supersededId };
}

