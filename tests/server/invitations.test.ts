import request from 'supertest';
import { count } from 'drizzle-orm';
import { invitations, musicians, user } from '@/server/db/schema';
import { createAccount, createTestContext, linkInMailTo, PASSWORD, signedInAgent, type TestContext } from './support/test-app';

const tokenFrom = (link: string) => link.split('/invitation/')[1] ?? '';

describe('invitations', () => {
  let ctx: TestContext;
  beforeEach(async () => {
    ctx = createTestContext();
    await createAccount(ctx, 'clinician', 'wren@clinic.example', 'Wren Ashby');
    await createAccount(ctx, 'clinician', 'other@clinic.example', 'Odile Park');
  });

  it('adds an invited musician to the caseload and e-mails a link that creates the account', async () => {
    const clinician = await signedInAgent(ctx, 'wren@clinic.example');
    const created = await clinician
      .post('/api/invitations')
      .send({ role: 'musician', name: 'Pia Lund', email: 'Pia.Lund@Students.example', instrument: 'Viola' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ role: 'musician', email: 'pia.lund@students.example', status: 'pending', emailSent: true });

    const link = linkInMailTo(ctx.outbox, 'pia.lund@students.example');
    expect(link.startsWith('http://ritorno.test/invitation/')).toBe(true);
    expect(ctx.outbox[0]?.subject).toContain('Wren Ashby');

    const caseloadBefore = await clinician.get('/api/musicians');
    expect(caseloadBefore.body).toEqual([expect.objectContaining({ name: 'Pia Lund', instrument: 'Viola', joined: false })]);

    const token = tokenFrom(link);
    const preview = await request(ctx.app).get(`/api/invitations/by-token/${token}`);
    expect(preview.body).toMatchObject({ role: 'musician', name: 'Pia Lund', invitedBy: 'Wren Ashby' });

    const accepted = await request(ctx.app).post(`/api/invitations/by-token/${token}/accept`).send({ password: PASSWORD });
    expect(accepted.status).toBe(201);

    const musician = await signedInAgent(ctx, 'pia.lund@students.example');
    expect((await musician.get('/api/me')).body).toMatchObject({ role: 'musician', name: 'Pia Lund' });
    expect((await musician.get('/api/me/musician')).body).toMatchObject({ instrument: 'Viola', clinicianName: 'Wren Ashby', plan: null });

    expect((await clinician.get('/api/musicians')).body).toEqual([expect.objectContaining({ name: 'Pia Lund', joined: true })]);
    const other = await signedInAgent(ctx, 'other@clinic.example');
    expect((await other.get('/api/musicians')).body).toEqual([]);
    expect((await other.get(`/api/musicians/${created.body.musicianId}`)).status).toBe(404);
  });

  it('refuses a used invitation link with 410', async () => {
    const clinician = await signedInAgent(ctx, 'wren@clinic.example');
    await clinician.post('/api/invitations').send({ role: 'teacher', name: 'Ruth Calder', email: 'ruth@school.example' });
    const token = tokenFrom(linkInMailTo(ctx.outbox, 'ruth@school.example'));
    await request(ctx.app).post(`/api/invitations/by-token/${token}/accept`).send({ password: PASSWORD }).expect(201);
    const again = await request(ctx.app).post(`/api/invitations/by-token/${token}/accept`).send({ password: PASSWORD });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('invitation_used');
    const teacher = await signedInAgent(ctx, 'ruth@school.example');
    expect((await teacher.get('/api/me')).body.role).toBe('teacher');
  });

  it('refuses an expired invitation link with 410 after seven days', async () => {
    const clinician = await signedInAgent(ctx, 'wren@clinic.example');
    await clinician.post('/api/invitations').send({ role: 'teacher', name: 'Ruth Calder', email: 'ruth@school.example' });
    const token = tokenFrom(linkInMailTo(ctx.outbox, 'ruth@school.example'));
    ctx.clock.now = new Date(ctx.clock.now.getTime() + 7 * 24 * 3600 * 1000 + 1);
    const late = await request(ctx.app).post(`/api/invitations/by-token/${token}/accept`).send({ password: PASSWORD });
    expect(late.status).toBe(410);
    expect(late.body.error.code).toBe('invitation_expired');
    expect((await clinician.get('/api/invitations')).body[0].status).toBe('expired');
  });

  it('answers 404 for an unknown token and 422 for a short password, creating no account', async () => {
    const unknown = await request(ctx.app).get('/api/invitations/by-token/not-a-real-token-at-all');
    expect(unknown.status).toBe(404);
    const clinician = await signedInAgent(ctx, 'wren@clinic.example');
    await clinician.post('/api/invitations').send({ role: 'teacher', name: 'Ruth Calder', email: 'ruth@school.example' });
    const token = tokenFrom(linkInMailTo(ctx.outbox, 'ruth@school.example'));
    const short = await request(ctx.app).post(`/api/invitations/by-token/${token}/accept`).send({ password: 'short' });
    expect(short.status).toBe(422);
    expect(short.body.error.issues).toEqual([expect.objectContaining({ path: 'password' })]);
    expect(ctx.db.select({ n: count() }).from(user).get()?.n).toBe(2);
  });

  it('refuses to invite an e-mail that already has an account, writing nothing', async () => {
    const clinician = await signedInAgent(ctx, 'wren@clinic.example');
    const clash = await clinician
      .post('/api/invitations')
      .send({ role: 'musician', name: 'Someone', email: 'other@clinic.example', instrument: 'Oboe' });
    expect(clash.status).toBe(409);
    expect(ctx.db.select({ n: count() }).from(musicians).get()?.n).toBe(0);
    expect(ctx.db.select({ n: count() }).from(invitations).get()?.n).toBe(0);
  });

  it('keeps the invitation when the e-mail cannot be sent, and says so', async () => {
    const logged = jest.spyOn(console, 'error').mockImplementation(() => undefined);
    ctx = createTestContext({ failMail: true });
    await createAccount(ctx, 'clinician', 'wren@clinic.example', 'Wren Ashby');
    const clinician = await signedInAgent(ctx, 'wren@clinic.example');
    const created = await clinician
      .post('/api/invitations')
      .send({ role: 'musician', name: 'Pia Lund', email: 'pia@students.example', instrument: 'Viola' });
    expect(created.status).toBe(201);
    expect(created.body.emailSent).toBe(false);
    expect((await clinician.get('/api/invitations')).body).toHaveLength(1);
    expect(logged).toHaveBeenCalledWith('[mail] invitation not sent:', expect.any(Error));
    logged.mockRestore();
  });
});
