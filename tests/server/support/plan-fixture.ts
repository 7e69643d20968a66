import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { checkIns, musicians, plans, user } from '@/server/db/schema';
import type { CheckIn } from '@/shared/schemas/check-in';
import { PlanSettingsSchema, type PlanSettingsInput } from '@/shared/schemas/plan-settings';
import { createAccount, type TestContext } from './test-app';

/** A clinician and a musician of theirs with an active plan, created straight in the database. */
export async function musicianWithPlan(
  ctx: TestContext,
  settings: Partial<PlanSettingsInput> & Pick<PlanSettingsInput, 'startDate'>,
  who = 'pia',
  history: CheckIn[] = [],
) {
  const clinicianEmail = `${who}.clinician@clinic.example`;
  const clinicianId = await createAccount(ctx, 'clinician', clinicianEmail, `Clinician of ${who}`);
  const email = `${who}@students.example`;
  const userId = await createAccount(ctx, 'musician', email, `Musician ${who}`);
  const musicianId = randomUUID();
  const now = ctx.clock.now;
  ctx.db.insert(musicians).values({ id: musicianId, clinicianId, userId, name: `Musician ${who}`, email, instrument: 'Viola', createdAt: now }).run();
  const parsed = PlanSettingsSchema.parse({ timeZone: 'Europe/London', event: { name: 'Spring recital', date: '2027-05-01' }, ...settings });
  ctx.db.insert(plans).values({ id: randomUUID(), musicianId, version: 1, status: 'active', settings: parsed, createdById: clinicianId, createdAt: now, activatedAt: now }).run();
  for (const [i, checkIn] of history.entries()) {
    ctx.db.insert(checkIns).values({ id: randomUUID(), musicianId, date: checkIn.date, kind: checkIn.kind, payload: checkIn, clientKey: `history-${i}`, recordedAt: now }).run();
  }
  return { musicianId, email, clinicianEmail, clinicianId, userId, settings: parsed };
}

export function userIdOf(ctx: TestContext, email: string): string {
  const row = ctx.db.select({ id: user.id }).from(user).where(eq(user.email, email)).get();
  if (!row) throw new Error(`no user ${email}`);
  return row.id;
}
