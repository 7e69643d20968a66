import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { checkIns, musicians, planOverrides, plans } from '@/server/db/schema';
import type { CheckIn } from '@/shared/schemas/check-in';
import { PlanSettingsSchema } from '@/shared/schemas/plan-settings';
import { musicianWithPlan } from './support/plan-fixture';
import { createTestContext, signedInAgent } from './support/test-app';

// The caseload keeps each musician's engine results under a fingerprint of their rows (caseload-cache.ts):
// every change below is written straight to the database, as any future code path might, and must show.
const painful: CheckIn = {
  kind: 'session', date: '2027-02-27', sessionIndex: 0, gates: [{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 4 }], redFlags: [], effort: 4, minutesPlayed: 5,
};

describe('caseload cache', () => {
  async function setup() {
    const ctx = createTestContext();
    const pia = await musicianWithPlan(ctx, { startDate: '2027-02-22' });
    const clinician = await signedInAgent(ctx, pia.clinicianEmail);
    const entry = async () => (await clinician.get('/api/musicians').expect(200)).body[0];
    const record = async () => (await clinician.get(`/api/musicians/${pia.musicianId}`).expect(200)).body;
    return { ctx, pia, entry, record };
  }

  it('does show a new check-in when the caseload was read before it', async () => {
    const { ctx, pia, entry, record } = await setup();
    expect((await entry()).alerts).toEqual([]);
    ctx.db.insert(checkIns).values({ id: randomUUID(), musicianId: pia.musicianId, date: painful.date, kind: painful.kind, payload: painful, clientKey: 'k1', recordedAt: ctx.clock.now }).run();
    expect((await entry()).alerts.map((a: { kind: string }) => a.kind)).toEqual(['failed_gate']);
    expect((await record()).lastCheckInDate).toBe('2027-02-27');
  });

  it('does show a renamed musician when the caseload was read before the change', async () => {
    const { ctx, pia, entry } = await setup();
    expect((await entry()).name).not.toBe('Pia Renamed');
    ctx.db.update(musicians).set({ name: 'Pia Renamed' }).where(eq(musicians.id, pia.musicianId)).run();
    expect((await entry()).name).toBe('Pia Renamed');
  });

  it('does show an override, a new plan version and a removed plan when they are written after a read', async () => {
    const { ctx, pia, entry } = await setup();
    expect((await entry()).status).toBe('on_track');
    ctx.db.insert(planOverrides).values({ id: randomUUID(), musicianId: pia.musicianId, action: 'hold', date: '2027-03-01', reason: 'Review first', byUserId: pia.clinicianId, at: ctx.clock.now }).run();
    expect((await entry()).status).toBe('held');

    const before = (await entry()).plan;
    const settings = PlanSettingsSchema.parse({ ...pia.settings, event: { name: 'Moved recital', date: '2027-06-01' } });
    ctx.db.update(plans).set({ status: 'superseded' }).where(eq(plans.musicianId, pia.musicianId)).run();
    ctx.db.insert(plans).values({ id: randomUUID(), musicianId: pia.musicianId, version: 2, status: 'active', settings, createdById: pia.clinicianId, createdAt: ctx.clock.now, activatedAt: ctx.clock.now }).run();
    const after = (await entry()).plan;
    expect(after.version).toBe(2);
    expect(after.event.name).toBe('Moved recital');
    expect(after.daysToEvent).toBeGreaterThan(before.daysToEvent);

    ctx.db.delete(plans).where(eq(plans.musicianId, pia.musicianId)).run();
    expect((await entry()).status).toBe('no_plan');
  });

  it('does move on with the calendar when the plan day changes', async () => {
    const { ctx, entry } = await setup();
    const today = (await entry()).plan.today;
    ctx.clock.now = new Date('2027-03-02T09:00:00Z');
    expect((await entry()).plan.today).not.toBe(today);
  });
});
