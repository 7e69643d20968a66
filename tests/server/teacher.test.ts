import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { demoHistory } from '@/server/db/demo-history';
import { clinicalNotes, documents, musicians, pieces } from '@/server/db/schema';
import { PlanSettingsSchema } from '@/shared/schemas/plan-settings';
import { progressionState } from '@/shared/scheduler';
import { musicianWithPlan } from './support/plan-fixture';
import { createAccount, createTestContext, signedInAgent, type TestContext } from './support/test-app';

const TODAY = '2027-03-01';
const PRIVATE = {
  problem: 'Left forearm extensor tendinopathy',
  note: 'Confidential: reviewed grip at the frog',
  document: 'Scan report March',
};

/** A musician part-way up their plan, with private records a teacher must never see. */
async function studentAtStage(ctx: TestContext) {
  const base = PlanSettingsSchema.parse({ startDate: '2027-02-08', event: { name: 'Spring recital', date: '2027-05-01' } });
  const history = demoHistory(base, TODAY);
  const reached = progressionState({ settings: base, checkIns: history, overrides: [], today: TODAY }).stageNumber;
  // Moderate pieces unlock exactly at the stage reached, so a step back takes them away again.
  const settings = { ...base, tierUnlockStage: { easy: 1, moderate: reached, demanding: reached + 2 } };
  const fixture = await musicianWithPlan(ctx, settings, 'pia', history);
  const now = ctx.clock.now;
  ctx.db.update(musicians).set({ problemSummary: PRIVATE.problem, problemRegion: 'forearm' }).where(eq(musicians.id, fixture.musicianId)).run();
  ctx.db.insert(clinicalNotes).values({ id: randomUUID(), musicianId: fixture.musicianId, authorId: fixture.clinicianId, body: PRIVATE.note, createdAt: now }).run();
  ctx.db.insert(documents).values({ id: randomUUID(), musicianId: fixture.musicianId, uploadedById: fixture.clinicianId, title: PRIVATE.document, fileName: 'scan.pdf', mimeType: 'application/pdf', sizeBytes: 10, storageKey: randomUUID(), visibility: 'shared', createdAt: now }).run();
  for (const [title, tier] of [['Air on a Quiet Theme', 'easy'], ['Harbour Rondo', 'moderate'], ['Storm Caprice', 'demanding']] as const) {
    ctx.db.insert(pieces).values({ id: randomUUID(), musicianId: fixture.musicianId, title, composer: 'Invented Composer', tier, passages: [], onProgramme: true, createdAt: now }).run();
  }
  return { ...fixture, reached };
}

const failedGate = (key: string) => ({
  clientKey: key,
  checkIn: { kind: 'session', date: TODAY, gates: [{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 4 }], effort: 6, minutesPlayed: 5, note: 'Sharp ache near the elbow' },
});

describe('the teacher view', () => {
  let ctx: TestContext;
  let student: Awaited<ReturnType<typeof studentAtStage>>;
  beforeEach(async () => {
    ctx = createTestContext();
    student = await studentAtStage(ctx);
    await createAccount(ctx, 'teacher', 'ruth@school.example', 'Ruth Calder');
    const musician = await signedInAgent(ctx, student.email);
    await musician.post('/api/shares').send({ name: 'Ruth Calder', email: 'ruth@school.example' }).expect(201);
  });

  it('shows a teacher only the students who shared, and nothing once sharing stops', async () => {
    const other = await musicianWithPlan(ctx, { startDate: '2027-02-22' }, 'otto');
    const teacher = await signedInAgent(ctx, 'ruth@school.example');
    const list = (await teacher.get('/api/students')).body;
    expect(list.map((s: { id: string }) => s.id)).toEqual([student.musicianId]);
    expect((await teacher.get(`/api/students/${other.musicianId}`)).status).toBe(404);

    const detail = (await teacher.get(`/api/students/${student.musicianId}`)).body;
    expect(detail.pieces.filter((p: { cleared: boolean }) => p.cleared).map((p: { title: string }) => p.title)).toEqual(['Air on a Quiet Theme', 'Harbour Rondo']);
    const storm = detail.pieces.find((p: { title: string }) => p.title === 'Storm Caprice');
    expect(storm.cleared).toBe(false);
    expect(storm.expectedOn > TODAY).toBe(true);

    const musician = await signedInAgent(ctx, student.email);
    const shares = (await musician.get('/api/shares')).body;
    await musician.delete(`/api/shares/teachers/${shares[0].teacherId}`).expect(204);
    expect((await teacher.get(`/api/students/${student.musicianId}`)).status).toBe(404);
    expect((await teacher.get(`/api/students/${student.musicianId}/print`)).status).toBe(404);
    expect((await teacher.get('/api/students')).body).toEqual([]);
  });

  it('e-mails the teacher when a failed gate takes pieces away, and never says why', async () => {
    const musician = await signedInAgent(ctx, student.email);
    const result = (await musician.post('/api/check-ins').send(failedGate('pain-after-block-1'))).body;
    expect(result.overview.status).toBe('stepped_back');
    expect(result.change).toMatch(/pain 4/);

    ctx.clock.now = new Date('2027-03-02T09:00:00Z');
    const teacher = await signedInAgent(ctx, 'ruth@school.example');
    const detail = (await teacher.get(`/api/students/${student.musicianId}`)).body;
    expect(detail.readiness).toBe('delayed');
    expect(detail.pieces.find((p: { title: string }) => p.title === 'Harbour Rondo').cleared).toBe(false);

    const mails = ctx.outbox.filter((mail) => mail.to === 'ruth@school.example' && mail.subject.startsWith('Playing clearance changed'));
    expect(mails).toHaveLength(1);
    expect(mails[0]?.text).toContain('Air on a Quiet Theme');
    expect(mails[0]?.text).not.toContain('Harbour Rondo');

    // Everything a teacher can receive, as one text: no score, symptom, record or reason.
    const list = await teacher.get('/api/students');
    const print = await teacher.get(`/api/students/${student.musicianId}/print`);
    const everything = [JSON.stringify(list.body), JSON.stringify(detail), print.text, ...ctx.outbox.filter((m) => m.to === 'ruth@school.example').map((m) => `${m.subject}\n${m.text}`)].join('\n');
    for (const secret of [PRIVATE.problem, PRIVATE.note, PRIVATE.document, 'forearm', 'Sharp ache', result.change, 'pain', 'Pain', 'gate', 'check-in', 'checkIn', 'effort', 'stepped', 'held', 'red flag', 'redFlag', 'symptom']) {
      expect(everything).not.toContain(secret);
    }
    expect(print.headers['content-type']).toContain('text/html');
    expect(print.text).toContain('Playing clearance: Musician pia');
  });

  it('lets the clinician see who the musician shares with, and no other clinician', async () => {
    const clinician = await signedInAgent(ctx, student.clinicianEmail);
    expect((await clinician.get(`/api/musicians/${student.musicianId}/shares`)).body).toEqual([
      expect.objectContaining({ name: 'Ruth Calder', email: 'ruth@school.example', status: 'active' }),
    ]);
    const other = await musicianWithPlan(ctx, { startDate: '2027-02-22' }, 'otto');
    const otherClinician = await signedInAgent(ctx, other.clinicianEmail);
    expect((await otherClinician.get(`/api/musicians/${student.musicianId}/shares`)).status).toBe(404);
  });

  it('invites a teacher without an account and shares when they accept', async () => {
    const musician = await signedInAgent(ctx, student.email);
    const shares = (await musician.post('/api/shares').send({ name: 'Dana Ives', email: 'dana@ensemble.example' })).body;
    expect(shares).toEqual(expect.arrayContaining([expect.objectContaining({ email: 'dana@ensemble.example', status: 'invited' })]));
    await new Promise((resolve) => setTimeout(resolve, 10));
    const mail = ctx.outbox.find((m) => m.to === 'dana@ensemble.example');
    expect(mail?.subject).toBe('Musician pia invited you to Ritorno');
    const token = mail?.text.match(/invitation\/(\S+)/)?.[1];
    const { default: request } = await import('supertest');
    await request(ctx.app).post(`/api/invitations/by-token/${token}/accept`).send({ password: 'correct-horse-battery' }).expect(201);
    const dana = await signedInAgent(ctx, 'dana@ensemble.example');
    expect((await dana.get('/api/students')).body.map((s: { name: string }) => s.name)).toEqual(['Musician pia']);
    const refused = await musician.post('/api/shares').send({ name: 'Clin', email: student.clinicianEmail });
    expect(refused.status).toBe(409);
  });
});
