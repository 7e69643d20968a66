import { count } from 'drizzle-orm';
import { clinicalNotes } from '@/server/db/schema';
import { progressionState, sessionsForRange } from '@/shared/scheduler';
import type { CheckIn } from '@/shared/schemas/check-in';
import { musicianWithPlan } from './support/plan-fixture';
import { createTestContext, signedInAgent, type TestContext } from './support/test-app';

// The test clock stands at 2027-03-01 09:00 UTC (a Monday); the plan started on Monday 2027-02-22.
const clean = (date: string, minutesPlayed = 10, effort = 3): CheckIn => ({
  kind: 'session', date, sessionIndex: 0, gates: [{ position: 'before', pain: 0 }, { position: 'after', afterBlock: 2, pain: 0 }], redFlags: [], effort, minutesPlayed,
});
const painful: CheckIn = {
  kind: 'session', date: '2027-02-27', sessionIndex: 0, gates: [{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 4 }], redFlags: [], effort: 5, minutesPlayed: 5,
};
const history: CheckIn[] = [clean('2027-02-22'), clean('2027-02-23'), clean('2027-02-24'), painful];

describe('musician record', () => {
  let ctx: TestContext;
  let fixture: Awaited<ReturnType<typeof musicianWithPlan>>;
  let base: string;
  beforeEach(async () => {
    ctx = createTestContext();
    fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22' }, 'pia', history);
    base = `/api/musicians/${fixture.musicianId}`;
  });

  it('updates the presenting problem field by field, clearing one with an empty string', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    await clinician.patch(`${base}/profile`).send({ problem: { region: 'Right forearm', side: 'right', onset: 'Gradual, after exams' } }).expect(200);
    const profile = (await clinician.patch(`${base}/profile`).send({ instrument: 'Viola d’amore', problem: { onset: '' } }).expect(200)).body;
    expect(profile).toMatchObject({ instrument: 'Viola d’amore', problem: { region: 'Right forearm', side: 'right', onset: null, summary: null } });
    expect((await clinician.get(`${base}/profile`)).body).toEqual(profile);
  });

  it('refuses an unknown side or an empty change and keeps the record as it was', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const side = await clinician.patch(`${base}/profile`).send({ problem: { side: 'upper' } });
    expect(side.status).toBe(422);
    expect(side.body.error.issues[0].path).toBe('problem.side');
    expect((await clinician.patch(`${base}/profile`).send({})).status).toBe(422);
    expect((await clinician.get(`${base}/profile`)).body.problem.side).toBeNull();
  });

  it('keeps clinical notes newest first, with their author, and refuses an empty one', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    await clinician.post(`${base}/notes`).send({ body: 'First visit.' }).expect(201);
    ctx.clock.now = new Date('2027-03-01T10:00:00Z');
    await clinician.post(`${base}/notes`).send({ body: 'Strap fitted.' }).expect(201);
    const notes = (await clinician.get(`${base}/notes`)).body;
    expect(notes.map((n: { body: string; authorName: string }) => [n.body, n.authorName])).toEqual([['Strap fitted.', 'Clinician of pia'], ['First visit.', 'Clinician of pia']]);
    expect((await clinician.post(`${base}/notes`).send({ body: ' ' })).status).toBe(422);
    expect(ctx.db.select({ n: count() }).from(clinicalNotes).get()?.n).toBe(2);
  });

  it('lists check-ins newest first, marking pain over the threshold', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const rows = (await clinician.get(`${base}/check-ins`)).body;
    expect(rows.map((r: { date: string }) => r.date)).toEqual(['2027-02-27', '2027-02-24', '2027-02-23', '2027-02-22']);
    expect(rows[0]).toMatchObject({ kind: 'session', highestPain: 4, overThreshold: true, minutesPlayed: 5, effort: 5 });
    expect(rows[1]).toMatchObject({ highestPain: 0, overThreshold: false });
  });

  it("charts the engine's planned minutes against the minutes played, with pain marks, up to the event", async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const chart = (await clinician.get(`${base}/chart`).expect(200)).body;
    const state = progressionState({ settings: fixture.settings, checkIns: history, overrides: [], today: '2027-03-01' });
    const planned = sessionsForRange(fixture.settings, state, '2027-02-22', '2027-05-01');
    expect(chart.days.map((d: { plannedMinutes: number }) => d.plannedMinutes)).toEqual(planned.map((d) => d.playingMinutes));
    expect(chart.days.at(-1)).toMatchObject({ date: '2027-05-01', kind: 'event', playedMinutes: null });
    const byDate = new Map(chart.days.map((d: { date: string }) => [d.date, d]));
    expect(byDate.get('2027-02-27')).toMatchObject({ playedMinutes: 5, sessionPain: 4, overThreshold: true, redFlag: false });
    expect(byDate.get('2027-02-26')).toMatchObject({ playedMinutes: 0, sessionPain: null });
    expect(chart.event).toEqual({ name: 'Spring recital', date: '2027-05-01' });
    expect(chart.stages[0]).toMatchObject({ stageNumber: 1, startDate: '2027-02-22', kind: 'actual' });
  });

  it('reports load as effort times minutes per day, with no ratio before four weeks of data', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const load = (await clinician.get(`${base}/load`).expect(200)).body;
    // Foster et al. 2001: session load = CR-10 effort x minutes.
    expect(load.days.find((d: { date: string }) => d.date === '2027-02-27')).toMatchObject({ minutes: 5, load: 25 });
    expect(load.days.find((d: { date: string }) => d.date === '2027-02-22')).toMatchObject({ minutes: 10, load: 30 });
    // Hulin et al. 2014: the ratio needs 28 days of data; 8 days here.
    expect(load.rolling).toBeNull();
    expect(load.warning).toEqual({ level: 'none', ratio: null, message: null });
  });

  it('answers 404 with its own code for a musician without an active plan', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const invited = await clinician.post('/api/invitations').send({ role: 'musician', name: 'New One', email: 'new.one@students.example', instrument: 'Oboe' });
    const chart = await clinician.get(`/api/musicians/${invited.body.musicianId}/chart`);
    expect(chart.status).toBe(404);
    expect(chart.body.error.code).toBe('no_active_plan');
  });
});
