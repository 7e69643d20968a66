import { randomUUID } from 'node:crypto';
import { pieces, setupItems } from '@/server/db/schema';
import { buildLadder, progressionState, publishedLevelsPreset } from '@/shared/scheduler';
import { MyPlanSchema } from '@/shared/schemas/my-plan';
import { musicianWithPlan } from './support/plan-fixture';
import { createTestContext, signedInAgent, type TestContext } from './support/test-app';

// The test clock stands at 2027-03-01 09:00 UTC (a Monday); the plan started on 2027-02-22.
const TODAY = '2027-03-01';

describe('the musician’s own plan (GET /api/plan)', () => {
  let ctx: TestContext;
  let fixture: Awaited<ReturnType<typeof musicianWithPlan>>;

  beforeEach(async () => {
    ctx = createTestContext();
    fixture = await musicianWithPlan(ctx, { ...publishedLevelsPreset.values, startDate: '2027-02-22', tierUnlockStage: { easy: 2, moderate: 3, demanding: 5 } });
    const at = ctx.clock.now;
    ctx.db
      .insert(pieces)
      .values([
        { id: randomUUID(), musicianId: fixture.musicianId, title: 'Air in G', tier: 'easy', onProgramme: true, createdAt: at },
        { id: randomUUID(), musicianId: fixture.musicianId, title: 'Harbour Toccata', tier: 'demanding', passages: [{ bars: 'bars 9-20', demands: ['speed'] }], createdAt: at },
      ])
      .run();
    ctx.db
      .insert(setupItems)
      .values([
        { id: randomUUID(), musicianId: fixture.musicianId, kind: 'strap', label: 'Neck strap', instructions: 'Wear it for every block.', active: true, createdById: fixture.clinicianId, createdAt: at },
        { id: randomUUID(), musicianId: fixture.musicianId, kind: 'seat_wedge', label: 'Old wedge', instructions: '', active: false, createdById: fixture.clinicianId, createdAt: at },
      ])
      .run();
  });

  it('gives the engine’s stages with today’s marked, and the published levels marked as such', async () => {
    const musician = await signedInAgent(ctx, fixture.email);
    const response = await musician.get('/api/plan').expect(200);
    const plan = MyPlanSchema.parse(response.body);
    const state = progressionState({ settings: fixture.settings, checkIns: [], overrides: [], today: TODAY });
    expect(plan.stages.map((s) => [s.stageNumber, s.startDate, s.endDate, s.kind])).toEqual(
      state.periods.map((p) => [p.stageIndex + 1, p.startDate, p.endDate, p.kind]),
    );
    expect(plan.stages.filter((s) => s.current)).toHaveLength(1);
    // BAPAM, "Returning to Playing and Performance for Instrumental Musicians": level 1 is play 5, rest 60, play 5.
    expect(plan.stages[0]).toMatchObject({ stageNumber: 1, minutesPerDay: 10, blockMinutes: 5, restMinutes: 60, basis: 'published' });
    const ladder = buildLadder(fixture.settings);
    expect(plan.stages.at(-1)).toMatchObject({ stageNumber: ladder.length, basis: 'rule' });
    expect(plan.event).toEqual({ name: 'Spring recital', date: '2027-05-01' });
  });

  it('dates the next unlock from the projection and lists what it clears', async () => {
    const musician = await signedInAgent(ctx, fixture.email);
    const plan = MyPlanSchema.parse((await musician.get('/api/plan')).body);
    expect(plan.overview.stageNumber).toBeLessThan(2);
    const stageTwo = plan.stages.find((s) => s.kind === 'projected' && s.stageNumber === 2);
    expect(plan.nextUnlock).toEqual({ stageNumber: 2, expectedOn: stageTwo?.startDate, tier: 'easy', passages: false, pieces: ['Air in G'] });
    const air = plan.pieces.find((p) => p.title === 'Air in G');
    expect(air).toMatchObject({ cleared: false, expectedOn: stageTwo?.startDate });
    const toccata = plan.pieces.find((p) => p.title === 'Harbour Toccata');
    expect(toccata?.expectedOn).toBe(plan.stages.find((s) => s.kind === 'projected' && s.stageNumber === 5)?.startDate);
    expect(plan.setup.map((s) => s.label)).toEqual(['Neck strap']);
  });

  it('explains a hold and pushes the next unlock later after pain over the threshold in a gate', async () => {
    const musician = await signedInAgent(ctx, fixture.email);
    const before = MyPlanSchema.parse((await musician.get('/api/plan')).body);
    const painful = { kind: 'session', date: TODAY, sessionIndex: 0, gates: [{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 3 }], redFlags: [], effort: 4, minutesPlayed: 5 };
    await musician.post('/api/check-ins').send({ clientKey: 'my-plan-pain-01', checkIn: painful }).expect(201);
    const after = MyPlanSchema.parse((await musician.get('/api/plan')).body);
    expect(['held', 'stepped_back']).toContain(after.overview.status);
    expect(after.changes[0]?.message).toMatch(/pain 3 after block 1/);
    expect(after.cleanDays).toBe(0);
    expect(String(after.nextUnlock?.expectedOn) > String(before.nextUnlock?.expectedOn)).toBe(true);
  });

  it('promises no dates while a red flag stops playing', async () => {
    const musician = await signedInAgent(ctx, fixture.email);
    const morning = { kind: 'next_morning', date: TODAY, pain: 0, redFlags: ['swelling'] };
    await musician.post('/api/check-ins').send({ clientKey: 'my-plan-flag-01', checkIn: morning }).expect(201);
    const plan = MyPlanSchema.parse((await musician.get('/api/plan')).body);
    expect(plan.overview).toMatchObject({ status: 'stopped', redFlagActive: true });
    expect(plan.nextUnlock?.expectedOn).toBeNull();
    expect(plan.pieces.every((p) => !p.cleared && p.expectedOn === null)).toBe(true);
  });

  it('never shows one musician another’s plan', async () => {
    const other = await musicianWithPlan(ctx, { startDate: '2027-02-08' }, 'otto');
    const otto = await signedInAgent(ctx, other.email);
    const plan = MyPlanSchema.parse((await otto.get('/api/plan')).body);
    expect(plan.stages[0]?.startDate).toBe('2027-02-08');
    expect(plan.pieces).toEqual([]);
    expect(plan.setup).toEqual([]);
  });
});
