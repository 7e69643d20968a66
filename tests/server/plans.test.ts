import { count, eq } from 'drizzle-orm';
import { auditEvents, planOverrides, plans } from '@/server/db/schema';
import { assessFeasibility, defaultPlanSettings, publishedLevelsPreset } from '@/shared/scheduler';
import { musicianWithPlan } from './support/plan-fixture';
import { createTestContext, signedInAgent, type TestContext } from './support/test-app';

// The test clock stands at 2027-03-01 09:00 UTC (a Monday).
const event = { name: 'Spring recital', date: '2027-05-01' };

describe('plan versions', () => {
  let ctx: TestContext;
  let fixture: Awaited<ReturnType<typeof musicianWithPlan>>;
  let base: string;
  beforeEach(async () => {
    ctx = createTestContext();
    fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22' });
    base = `/api/musicians/${fixture.musicianId}`;
  });

  it("offers the engine's defaults and the published-levels preset to the plan builder", async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const presets = (await clinician.get('/api/plan-presets').expect(200)).body;
    const defaults = defaultPlanSettings({ startDate: '2027-03-08', event });
    expect(presets.defaults.targetMinutesPerDay).toBe(defaults.targetMinutesPerDay);
    expect(presets.defaults.painThreshold).toEqual({ session: 0, nextMorning: 0 });
    expect(presets.defaults.startDate).toBeUndefined();
    // BAPAM, "Returning to Playing and Performance for Instrumental Musicians": level 1 play 5 / rest 60.
    expect(presets.presets[0].id).toBe(publishedLevelsPreset.id);
    expect(presets.presets[0].values.fixedLevels[0]).toMatchObject({ minutesPerDay: 10, blockMinutes: 5, restMinutes: 60 });
  });

  it('saves a draft with the defaults filled in when only the start and the event are given', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const draft = (await clinician.post(`${base}/plans`).send({ settings: { startDate: '2027-03-08', event } }).expect(201)).body;
    expect(draft).toMatchObject({ version: 2, status: 'draft', createdBy: 'Clinician of pia', activatedAt: null });
    expect(draft.settings).toEqual(defaultPlanSettings({ startDate: '2027-03-08', event }));
    const versions = (await clinician.get(`${base}/plans`)).body;
    expect(versions.map((v: { version: number; status: string }) => [v.version, v.status])).toEqual([[2, 'draft'], [1, 'active']]);
  });

  it('refuses an event before the start, naming the field, and saves nothing', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const response = await clinician.post(`${base}/plans`).send({ settings: { startDate: '2027-03-08', event: { name: 'Recital', date: '2027-03-01' }, targetMinutesPerDay: 'lots' } });
    expect(response.status).toBe(422);
    const paths = response.body.error.issues.map((issue: { path: string }) => issue.path);
    expect(paths).toContain('settings.targetMinutesPerDay');
    expect(ctx.db.select({ n: count() }).from(plans).get()?.n).toBe(1);
    const dates = await clinician.post(`${base}/plans/preview`).send({ settings: { startDate: '2027-03-08', event: { name: 'Recital', date: '2027-03-01' } } });
    expect(dates.body.error.issues).toContainEqual({ path: 'settings.event.date', message: 'The event must come after the start date' });
  });

  it('shows an event out of reach with its reduced programme, and in reach once the date moves', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    await clinician.post(`${base}/pieces`).send({ title: 'Slow air', tier: 'easy', onProgramme: true }).expect(201);
    await clinician.post(`${base}/pieces`).send({ title: 'Fast finale', tier: 'demanding', onProgramme: true, passages: [{ bars: 'bars 1-20', demands: ['speed'] }] }).expect(201);
    const tooClose = { startDate: '2027-03-08', event: { name: 'Recital', date: '2027-03-29' }, targetMinutesPerDay: 120 };
    const preview = (await clinician.post(`${base}/plans/preview`).send({ settings: tooClose }).expect(200)).body;
    expect(preview.feasibility.feasible).toBe(false);
    expect(preview.feasibility.reducedProgramme.ready.map((p: { title: string }) => p.title)).toEqual(['Slow air']);
    expect(preview.feasibility.reducedProgramme.notReady.map((p: { title: string }) => p.title)).toEqual(['Fast finale']);
    const engine = assessFeasibility(defaultPlanSettings(tooClose), []);
    expect(preview.feasibility).toMatchObject({ daysShort: engine.daysShort, targetReachedOn: engine.targetReachedOn });
    expect(preview.feasibility.daysShort).toBeGreaterThan(0);
    const later = { ...tooClose, event: { ...tooClose.event, date: preview.feasibility.earliestFeasibleEventDate } };
    const fits = (await clinician.post(`${base}/plans/preview`).send({ settings: later }).expect(200)).body;
    expect(fits.feasibility).toMatchObject({ feasible: true, daysShort: 0 });
    expect(fits.stages.length).toBeGreaterThan(1);
  });

  it('activates a draft, supersedes the active version in one step and e-mails the musician', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const draft = (await clinician.post(`${base}/plans`).send({ settings: { startDate: '2027-03-08', event } })).body;
    const activated = (await clinician.post(`${base}/plans/${draft.id}/activate`).expect(200)).body;
    expect(activated).toMatchObject({ id: draft.id, status: 'active', activatedAt: ctx.clock.now.toISOString(), emailSent: true });
    const rows = ctx.db.select({ version: plans.version, status: plans.status }).from(plans).all();
    expect(rows.sort((a, b) => a.version - b.version)).toEqual([{ version: 1, status: 'superseded' }, { version: 2, status: 'active' }]);
    const mail = ctx.outbox.find((m) => m.to === fixture.email);
    expect(mail?.subject).toBe('Your return-to-playing plan is ready (version 2)');
    expect(mail?.text).toContain('Pain is a signal to stop');
    expect((await clinician.post(`${base}/plans/${draft.id}/activate`)).status).toBe(409);
    const audit = ctx.db.select({ action: auditEvents.action }).from(auditEvents).where(eq(auditEvents.musicianId, fixture.musicianId)).all();
    expect(audit.map((a) => a.action)).toEqual(['plan.draft_created', 'plan.activated']);
  });

  it('keeps the plan active even when the activation e-mail cannot be sent', async () => {
    const failing = createTestContext({ failMail: true });
    const f = await musicianWithPlan(failing, { startDate: '2027-02-22' });
    const clinician = await signedInAgent(failing, f.clinicianEmail);
    const draft = (await clinician.post(`/api/musicians/${f.musicianId}/plans`).send({ settings: { startDate: '2027-03-08', event } })).body;
    const activated = (await clinician.post(`/api/musicians/${f.musicianId}/plans/${draft.id}/activate`).expect(200)).body;
    expect(activated).toMatchObject({ status: 'active', emailSent: false });
  });

  it('makes a new version when the active plan is edited, and refuses to edit a superseded one', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const [active] = (await clinician.get(`${base}/plans`)).body;
    const edited = await clinician.patch(`${base}/plans/${active.id}`).send({ settings: { ...active.settings, targetMinutesPerDay: 60 } });
    expect(edited.status).toBe(201);
    expect(edited.body).toMatchObject({ version: 2, status: 'draft' });
    expect((await clinician.get(`${base}/plan`)).body.plan.settings.targetMinutesPerDay).toBe(90);
    const tweaked = await clinician.patch(`${base}/plans/${edited.body.id}`).send({ settings: { ...active.settings, targetMinutesPerDay: 70 } });
    expect(tweaked.status).toBe(200);
    expect(tweaked.body).toMatchObject({ id: edited.body.id, version: 2 });
    await clinician.post(`${base}/plans/${edited.body.id}/activate`).expect(200);
    expect((await clinician.get(`${base}/plan`)).body.plan.settings.targetMinutesPerDay).toBe(70);
    const stale = await clinician.patch(`${base}/plans/${active.id}`).send({ settings: active.settings });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('superseded');
    expect((await clinician.delete(`${base}/plans/${edited.body.id}`)).status).toBe(409);
  });
});

describe('overrides', () => {
  let ctx: TestContext;
  let fixture: Awaited<ReturnType<typeof musicianWithPlan>>;
  let base: string;
  beforeEach(async () => {
    ctx = createTestContext();
    fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22' });
    base = `/api/musicians/${fixture.musicianId}/plan`;
  });

  it('records a hold with who, when and why, and explains it in the history', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const result = (await clinician.post(`${base}/overrides`).send({ action: 'hold', reason: 'Wait for the new chin rest' }).expect(201)).body;
    expect(result.override).toMatchObject({ action: 'hold', date: '2027-03-01', reason: 'Wait for the new chin rest', by: 'Clinician of pia', at: ctx.clock.now.toISOString() });
    expect(result.state.overview.status).toBe('held');
    expect(result.state.history.at(-1)).toMatchObject({ kind: 'clinician_hold', by: 'Clinician of pia' });
    expect(result.state.history.at(-1).message).toContain('Wait for the new chin rest');
    expect((await clinician.get(`${base}/overrides`)).body).toEqual([result.override]);
    // Besides reads of the record (audited too), the one change recorded is the hold.
    const changes = ctx.db.select({ action: auditEvents.action }).from(auditEvents).all().filter((row) => row.action !== 'record.read');
    expect(changes).toEqual([{ action: 'override.hold' }]);
  });

  it('refuses an override without a reason or dated after today, recording nothing', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const blank = await clinician.post(`${base}/overrides`).send({ action: 'hold', reason: '  ' });
    expect(blank.status).toBe(422);
    expect(blank.body.error.issues[0].path).toBe('reason');
    const future = await clinician.post(`${base}/overrides`).send({ action: 'hold', reason: 'Later', date: '2027-03-02' });
    expect(future.status).toBe(422);
    expect(future.body.error.code).toBe('future_date');
    expect(ctx.db.select({ n: count() }).from(planOverrides).get()?.n).toBe(0);
  });

  it('refuses an override the engine would ignore, such as clearing a red flag nobody reported', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const response = await clinician.post(`${base}/overrides`).send({ action: 'clear_red_flag', reason: 'Reviewed' });
    expect(response.status).toBe(409);
    expect(response.body.error).toMatchObject({ code: 'no_effect', message: 'No red flag is active.' });
    expect(ctx.db.select({ n: count() }).from(planOverrides).get()?.n).toBe(0);
  });

  it('lets playing restart after a red flag only once the clinician clears it', async () => {
    const musician = await signedInAgent(ctx, fixture.email);
    await musician.post('/api/check-ins').send({ clientKey: 'morning-red-flag', checkIn: { kind: 'next_morning', date: '2027-03-01', pain: 0, redFlags: ['tingling'] } }).expect(201);
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    expect((await clinician.get(base)).body.overview.status).toBe('stopped');
    const cleared = (await clinician.post(`${base}/overrides`).send({ action: 'clear_red_flag', reason: 'Examined: no nerve signs' }).expect(201)).body;
    expect(cleared.state.overview).toMatchObject({ status: 'on_track', redFlagActive: false });
    expect(cleared.state.history.at(-1).kind).toBe('red_flag_cleared');
  });

  it('steps back one stage on the clinician’s word, effective the next day', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    await clinician.post(`${base}/overrides`).send({ action: 'advance', reason: 'Comfortable all week', date: '2027-02-28' }).expect(201);
    expect((await clinician.get(base)).body.overview.stageNumber).toBe(2);
    const back = (await clinician.post(`${base}/overrides`).send({ action: 'step_back', reason: 'Ache after the lesson' }).expect(201)).body;
    expect(back.state.history.at(-1)).toMatchObject({ kind: 'clinician_step_back', fromStage: 2, toStage: 1 });
    expect(back.state.overrides.map((o: { action: string }) => o.action)).toEqual(['step_back', 'advance']);
  });
});
