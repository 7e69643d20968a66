import { musicianWithPlan } from './support/plan-fixture';
import { createTestContext, signedInAgent, type TestContext } from './support/test-app';

// The test clock stands at 2027-03-01 09:00 UTC; the plan started on 2027-02-22, so stage 1 today.
describe('repertoire and setup', () => {
  let ctx: TestContext;
  let fixture: Awaited<ReturnType<typeof musicianWithPlan>>;
  let base: string;
  beforeEach(async () => {
    ctx = createTestContext();
    fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22', tierUnlockStage: { easy: 1, moderate: 2, demanding: 4 }, passagesUnlockStage: 3 });
    base = `/api/musicians/${fixture.musicianId}`;
  });

  it('derives clearance from the plan state, so a clinician advance clears the next tier at once', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const piece = (await clinician.post(`${base}/pieces`).send({ title: 'Romance', composer: 'Ines Holt', tier: 'moderate', onProgramme: true, passages: [{ bars: 'bars 30-41', demands: ['stretch'] }] }).expect(201)).body;
    expect(piece.clearance).toMatchObject({ clearedFromStage: 2, passagesFromStage: 3, cleared: false, passagesCleared: false });
    await clinician.post(`${base}/plan/overrides`).send({ action: 'advance', reason: 'Settled well', date: '2027-02-28' }).expect(201);
    const [after] = (await clinician.get(`${base}/pieces`)).body;
    expect(after.clearance).toMatchObject({ cleared: true, passagesCleared: false, expectedOn: '2027-03-01' });
  });

  it('edits only the fields sent and refuses a passage without demands, keeping the piece', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const piece = (await clinician.post(`${base}/pieces`).send({ title: 'Study', tier: 'easy', onProgramme: true })).body;
    const renamed = (await clinician.patch(`${base}/pieces/${piece.id}`).send({ title: 'Study in A' }).expect(200)).body;
    expect(renamed).toMatchObject({ title: 'Study in A', tier: 'easy', onProgramme: true });
    const bad = await clinician.patch(`${base}/pieces/${piece.id}`).send({ passages: [{ bars: 'bars 1-4', demands: [] }] });
    expect(bad.status).toBe(422);
    expect(bad.body.error.issues[0]).toEqual({ path: 'passages.0.demands', message: 'Pick at least one demand' });
    await clinician.delete(`${base}/pieces/${piece.id}`).expect(204);
    expect((await clinician.get(`${base}/pieces`)).body).toEqual([]);
    expect((await clinician.delete(`${base}/pieces/${piece.id}`)).status).toBe(404);
  });

  it('reminds the musician of active setup items only', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const wedge = (await clinician.post(`${base}/setup`).send({ kind: 'seat_wedge', label: 'Forward-sloping seat wedge', instructions: 'Tilt forward, about 15 degrees.' }).expect(201)).body;
    const strap = (await clinician.post(`${base}/setup`).send({ kind: 'strap', label: 'Neck strap' }).expect(201)).body;
    expect(strap).toMatchObject({ active: true, instructions: '' });
    await clinician.patch(`${base}/setup/${strap.id}`).send({ active: false }).expect(200);
    const musician = await signedInAgent(ctx, fixture.email);
    const today = (await musician.get('/api/today').expect(200)).body;
    expect(today.setup).toEqual([{ id: wedge.id, label: 'Forward-sloping seat wedge', instructions: 'Tilt forward, about 15 degrees.' }]);
    expect((await clinician.get(`${base}/setup`)).body.map((i: { label: string }) => i.label)).toEqual(['Forward-sloping seat wedge', 'Neck strap']);
  });

  it('refuses an unknown setup kind or a missing label', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const response = await clinician.post(`${base}/setup`).send({ kind: 'cushion' });
    expect(response.status).toBe(422);
    expect(response.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['kind', 'label']);
    expect((await clinician.get(`${base}/setup`)).body).toEqual([]);
  });

  it('prints the plan as a self-contained page with the rules and cautions, escaping every user string', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    await clinician.post(`${base}/pieces`).send({ title: '<script>alert(1)</script> Etude', tier: 'easy' }).expect(201);
    await clinician.post(`${base}/setup`).send({ kind: 'custom', label: 'Stand "higher" & closer' }).expect(201);
    const page = await clinician.get(`${base}/plan/print`).expect(200);
    expect(page.headers['content-type']).toMatch(/^text\/html/);
    expect(page.text).not.toContain('<script>');
    expect(page.text).toContain('&lt;script&gt;alert(1)&lt;/script&gt; Etude');
    expect(page.text).toContain('Stand &quot;higher&quot; &amp; closer');
    expect(page.text).toContain('Pain is a signal to stop, not to push through.');
    expect(page.text).toContain('never replaces');
    expect(page.text).toContain('prompt clinical review');
    expect(page.text).toContain('local regulations');
    expect(page.text).toMatch(/Stop playing at once on any pain/);
    expect(page.text).toContain('2027-02-22 to');
    expect(page.text).not.toMatch(/<link|<script|src="http/);
  });
});
