import { randomUUID } from 'node:crypto';
import { checkIns, musicians, plans } from '@/server/db/schema';
import type { CheckIn } from '@/shared/schemas/check-in';
import { PlanSettingsSchema } from '@/shared/schemas/plan-settings';
import { musicianWithPlan } from './support/plan-fixture';
import { createTestContext, signedInAgent } from './support/test-app';

// The test clock stands at 2027-03-01 09:00 UTC (a Monday).
const gatePain: CheckIn = {
  kind: 'session', date: '2027-02-27', sessionIndex: 0, gates: [{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 3 }], redFlags: [], effort: 4, minutesPlayed: 5,
};
const redFlag: CheckIn = { kind: 'next_morning', date: '2027-03-01', pain: 1, redFlags: ['numbness'] };

type Entry = { name: string; status: string; lastCheckInDate: string | null; alerts: { kind: string; severity: string; message: string }[] };

describe('caseload', () => {
  async function caseload() {
    const ctx = createTestContext();
    const held = await musicianWithPlan(ctx, { startDate: '2027-02-22' }, 'anna', [gatePain]);
    const clinicianId = held.clinicianId;
    const addPlanned = (name: string, settings: object, checkIns: CheckIn[] = []) => {
      const id = randomUUID();
      ctx.db.insert(musicians).values({ id, clinicianId, name, email: `${name.toLowerCase()}@students.example`, instrument: 'Horn', createdAt: ctx.clock.now }).run();
      const parsed = PlanSettingsSchema.parse({ startDate: '2027-02-22', event: { name: 'Showcase', date: '2027-05-01' }, ...settings });
      ctx.db.insert(plans).values({ id: randomUUID(), musicianId: id, version: 1, status: 'active', settings: parsed, createdById: clinicianId, createdAt: ctx.clock.now, activatedAt: ctx.clock.now }).run();
      return id;
    };
    const flagged = addPlanned('Bruno', {});
    addPlanned('Cleo', { event: { name: 'Showcase', date: '2027-03-20' }, targetMinutesPerDay: 120 });
    addPlanned('Dora', {});
    const clinician = await signedInAgent(ctx, held.clinicianEmail);
    return { ctx, clinician, flagged };
  }

  it('puts red flags, failed gates and plans out of reach on the list, urgent first when asked', async () => {
    const { ctx, clinician, flagged } = await caseload();
    ctx.db.insert(checkIns).values({ id: randomUUID(), musicianId: flagged, date: redFlag.date, kind: redFlag.kind, payload: redFlag, clientKey: 'flag-1', recordedAt: ctx.clock.now }).run();
    const byName: Entry[] = (await clinician.get('/api/musicians').expect(200)).body;
    expect(byName.map((e) => e.name)).toEqual(['Bruno', 'Cleo', 'Dora', 'Musician anna']);
    const anna = byName.find((e) => e.name === 'Musician anna');
    expect(anna).toMatchObject({ status: 'held', lastCheckInDate: '2027-02-27' });
    expect(anna?.alerts).toEqual([expect.objectContaining({ kind: 'failed_gate', severity: 'warning' })]);
    expect(anna?.alerts[0]?.message).toContain('pain 3 after block 1');
    const bruno = byName.find((e) => e.name === 'Bruno');
    expect(bruno).toMatchObject({ status: 'stopped', lastCheckInDate: '2027-03-01' });
    expect(bruno?.alerts.map((a) => [a.kind, a.severity])).toEqual([['red_flag', 'urgent'], ['failed_gate', 'warning']]);
    expect(byName.find((e) => e.name === 'Cleo')?.alerts.map((a) => a.kind)).toEqual(['infeasible']);
    expect(byName.find((e) => e.name === 'Dora')).toMatchObject({ status: 'on_track', lastCheckInDate: null, alerts: [] });

    const urgent: Entry[] = (await clinician.get('/api/musicians?sort=alerts').expect(200)).body;
    expect(urgent.map((e) => e.name)).toEqual(['Bruno', 'Cleo', 'Musician anna', 'Dora']);
    const onlyAlerts: Entry[] = (await clinician.get('/api/musicians?alerts=only&status=held').expect(200)).body;
    expect(onlyAlerts.map((e) => e.name)).toEqual(['Musician anna']);
  });

  it('refuses an unknown sort with the field named', async () => {
    const { clinician } = await caseload();
    const response = await clinician.get('/api/musicians?sort=shoe-size');
    expect(response.status).toBe(422);
    expect(response.body.error.issues[0].path).toBe('sort');
  });
});
