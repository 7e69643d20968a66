import { count } from 'drizzle-orm';
import { checkIns } from '@/server/db/schema';
import { progressionState, sessionsForDate } from '@/shared/scheduler';
import { musicianWithPlan } from './support/plan-fixture';
import { createTestContext, signedInAgent, type TestContext } from './support/test-app';

// The test clock stands at 2027-03-01 09:00 UTC (a Monday); the plan started on 2027-02-22.
const TODAY = '2027-03-01';

function cleanSession(sessionIndex = 0) {
  return {
    kind: 'session',
    date: TODAY,
    sessionIndex,
    gates: [
      { position: 'before', pain: 0 },
      { position: 'after', afterBlock: 2, pain: 0 },
    ],
    redFlags: [],
    effort: 3,
    minutesPlayed: 10,
  };
}

describe('today and check-ins', () => {
  let ctx: TestContext;
  let fixture: Awaited<ReturnType<typeof musicianWithPlan>>;
  beforeEach(async () => {
    ctx = createTestContext();
    fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22' });
  });

  it("gives the musician the engine's sessions for today", async () => {
    const musician = await signedInAgent(ctx, fixture.email);
    const today = (await musician.get('/api/today')).body;
    const state = progressionState({ settings: fixture.settings, checkIns: [], overrides: [], today: TODAY });
    const expected = sessionsForDate(fixture.settings, state, TODAY);
    expect(today.date).toBe(TODAY);
    expect(today.kind).toBe(expected.kind);
    expect(today.sessions.map((s: { items: unknown[] }) => s.items)).toEqual(expected.sessions.map((s) => s.items));
    expect(today.painThreshold).toEqual({ session: 0, nextMorning: 0 });
  });

  it('saves a check-in once when the upload is retried with the same key', async () => {
    const musician = await signedInAgent(ctx, fixture.email);
    const upload = { clientKey: 'session-2027-03-01-0-abc', checkIn: cleanSession() };
    const first = await musician.post('/api/check-ins').send(upload);
    expect(first.status).toBe(201);
    const retry = await musician.post('/api/check-ins').send(upload);
    expect(retry.status).toBe(200);
    expect(retry.body).toMatchObject({ id: first.body.id, duplicate: true });
    expect(ctx.db.select({ n: count() }).from(checkIns).get()?.n).toBe(1);
    expect(ctx.outbox).toEqual([]);
    expect((await musician.get('/api/today')).body.sessions[0].done).toBe(true);
  });

  it('ends the day, holds the plan and e-mails the clinician once when a gate goes over the threshold', async () => {
    const musician = await signedInAgent(ctx, fixture.email);
    const painful = { ...cleanSession(), gates: [{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 3 }], minutesPlayed: 5 };
    const upload = { clientKey: 'session-pain-0001', checkIn: painful };
    const result = (await musician.post('/api/check-ins').send(upload)).body;
    expect(result).toMatchObject({ stopPlaying: true, redFlag: false, clinicianNotified: true });
    expect(result.change).toMatch(/pain 3 after block 1/);
    expect(['held', 'stepped_back']).toContain(result.overview.status);
    await musician.post('/api/check-ins').send(upload).expect(200);
    const alerts = ctx.outbox.filter((mail) => mail.to === fixture.clinicianEmail);
    expect(alerts).toHaveLength(1);
    expect(alerts[0]?.subject).toBe('Pain gate: Musician pia went over the threshold');
    const today = (await musician.get('/api/today')).body;
    expect(today.kind).toBe('ended');
    expect(today.sessions).toEqual([]);
  });

  it('stops all playing and sends an urgent e-mail on a red flag', async () => {
    const musician = await signedInAgent(ctx, fixture.email);
    const morning = { kind: 'next_morning', date: TODAY, pain: 0, redFlags: ['numbness'] };
    const result = (await musician.post('/api/check-ins').send({ clientKey: 'morning-0001', checkIn: morning })).body;
    expect(result).toMatchObject({ stopPlaying: true, redFlag: true, clinicianNotified: true });
    expect(result.overview).toMatchObject({ status: 'stopped', redFlagActive: true, minutesPerDay: 0 });
    expect(ctx.outbox[0]?.subject).toBe('Red flag: Musician pia has stopped playing');
    expect(ctx.outbox[0]?.text).toContain('numbness');
    expect((await musician.get('/api/today')).body.kind).toBe('stopped');
  });

  it('refuses a check-in dated after today or with pain off the 0-10 scale, saving nothing', async () => {
    const musician = await signedInAgent(ctx, fixture.email);
    const future = await musician.post('/api/check-ins').send({ clientKey: 'future-0001', checkIn: { ...cleanSession(), date: '2027-03-02' } });
    expect(future.status).toBe(422);
    expect(future.body.error.code).toBe('future_date');
    const offScale = await musician
      .post('/api/check-ins')
      .send({ clientKey: 'scale-0001', checkIn: { ...cleanSession(), gates: [{ position: 'before', pain: 11 }] } });
    expect(offScale.status).toBe(422);
    expect(offScale.body.error.issues[0].path).toBe('checkIn.gates.0.pain');
    expect(ctx.db.select({ n: count() }).from(checkIns).get()?.n).toBe(0);
  });

  it("never shows one musician another's check-ins", async () => {
    const other = await musicianWithPlan(ctx, { startDate: '2027-02-22' }, 'otto');
    const pia = await signedInAgent(ctx, fixture.email);
    await pia.post('/api/check-ins').send({ clientKey: 'pia-0000001', checkIn: cleanSession() }).expect(201);
    const otto = await signedInAgent(ctx, other.email);
    expect((await otto.get('/api/check-ins')).body).toEqual([]);
    expect((await pia.get('/api/check-ins')).body).toHaveLength(1);
  });
});
