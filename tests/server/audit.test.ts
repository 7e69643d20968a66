import { musicianWithPlan } from './support/plan-fixture';
import { createAccount, createTestContext, signedInAgent } from './support/test-app';

describe('audit trail', () => {
  it('records reads of a record and changes to plans and sharing, shown to its clinician and to an admin', async () => {
    const ctx = createTestContext();
    const fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22' });
    const other = await musicianWithPlan(ctx, { startDate: '2027-02-22' }, 'otto');
    await createAccount(ctx, 'teacher', 'ruth@school.example', 'Ruth Calder');
    await createAccount(ctx, 'admin', 'admin@ritorno.example');
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const musician = await signedInAgent(ctx, fixture.email);

    await clinician.get(`/api/musicians/${fixture.musicianId}/notes`).expect(200);
    await clinician.post(`/api/musicians/${fixture.musicianId}/plan/overrides`).send({ action: 'hold', reason: 'Reviewing the shoulder rest' }).expect(201);
    await musician.post('/api/shares').send({ name: 'Ruth Calder', email: 'ruth@school.example' }).expect(201);
    const shares = (await musician.get('/api/shares')).body;
    await musician.delete(`/api/shares/teachers/${shares[0].teacherId}`).expect(204);

    const trail = (await clinician.get(`/api/musicians/${fixture.musicianId}/audit`)).body as { action: string; actorName: string; detail: Record<string, unknown> }[];
    const actions = trail.map((entry) => entry.action);
    expect(actions).toEqual(expect.arrayContaining(['record.read', 'override.hold', 'share.created', 'share.stopped']));
    expect(trail.find((entry) => entry.action === 'record.read')?.detail.path).toBe(`/api/musicians/${fixture.musicianId}/notes`);
    expect(trail.find((entry) => entry.action === 'share.created')?.actorName).toBe('Musician pia');

    // Another clinician's record is not theirs to see; an admin sees every record's trail.
    const otherClinician = await signedInAgent(ctx, other.clinicianEmail);
    expect((await otherClinician.get(`/api/musicians/${fixture.musicianId}/audit`)).status).toBe(404);
    const admin = await signedInAgent(ctx, 'admin@ritorno.example');
    const all = (await admin.get('/api/admin/audit')).body as { musicianId: string }[];
    // Reading the trail is itself a read of the record, so the admin sees one more line.
    expect(all.filter((entry) => entry.musicianId === fixture.musicianId).length).toBe(trail.length + 1);
  });
});
