import request from 'supertest';
import { createAccount, createTestContext, linkInMailTo, PASSWORD, signedInAgent, type TestContext } from './support/test-app';

describe('sign-in and roles', () => {
  let ctx: TestContext;
  beforeEach(() => {
    ctx = createTestContext();
  });

  it('makes a clinician of anyone who signs up', async () => {
    const signUp = await request(ctx.app)
      .post('/api/auth/sign-up/email')
      .send({ name: 'Wren Ashby', email: 'wren@clinic.example', password: PASSWORD });
    expect(signUp.status).toBe(200);
    const clinician = await signedInAgent(ctx, 'wren@clinic.example');
    expect((await clinician.get('/api/me')).body).toMatchObject({ name: 'Wren Ashby', role: 'clinician' });
  });

  it('refuses a role chosen at sign-up, so nobody makes themselves an admin', async () => {
    const signUp = await request(ctx.app)
      .post('/api/auth/sign-up/email')
      .send({ name: 'Mallory', email: 'mallory@example.org', password: PASSWORD, role: 'admin' });
    expect(signUp.status).toBe(400);
    const signIn = await request(ctx.app).post('/api/auth/sign-in/email').send({ email: 'mallory@example.org', password: PASSWORD });
    expect(signIn.status).toBe(401);
  });

  it('refuses a wrong password and ends the session on sign-out', async () => {
    await createAccount(ctx, 'musician', 'pia@students.example');
    const wrong = await request(ctx.app).post('/api/auth/sign-in/email').send({ email: 'pia@students.example', password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    const agent = await signedInAgent(ctx, 'pia@students.example');
    expect((await agent.get('/api/me')).status).toBe(200);
    await agent.post('/api/auth/sign-out').set('origin', 'http://ritorno.test').send({}).expect(200);
    expect((await agent.get('/api/me')).status).toBe(401);
  });

  it('resets a forgotten password through the e-mailed link', async () => {
    await createAccount(ctx, 'teacher', 'ruth@school.example', 'Ruth Calder');
    await request(ctx.app)
      .post('/api/auth/request-password-reset')
      .send({ email: 'ruth@school.example', redirectTo: '/reset-password' })
      .expect(200);
    // The mail is sent in the background.
    await new Promise((resolve) => setTimeout(resolve, 20));
    const link = new URL(linkInMailTo(ctx.outbox, 'ruth@school.example'));
    expect(link.pathname).toBe('/reset-password');
    const token = link.searchParams.get('token') ?? '';
    await request(ctx.app).post('/api/auth/reset-password').send({ token, newPassword: 'a-brand-new-password' }).expect(200);
    await signedInAgent(ctx, 'ruth@school.example', 'a-brand-new-password');
    const old = await request(ctx.app).post('/api/auth/sign-in/email').send({ email: 'ruth@school.example', password: PASSWORD });
    expect(old.status).toBe(401);
  });

  it('answers a reset request for an unknown address the same way, sending nothing', async () => {
    const response = await request(ctx.app).post('/api/auth/request-password-reset').send({ email: 'nobody@example.org' });
    expect(response.status).toBe(200);
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(ctx.outbox).toEqual([]);
  });
});

describe('sign-in attempts', () => {
  it('refuses the eleventh attempt in a minute from one address with 429', async () => {
    const ctx = createTestContext();
    await createAccount(ctx, 'clinician', 'wren@clinic.example');
    const attempt = () => request(ctx.app).post('/api/auth/sign-in/email').send({ email: 'wren@clinic.example', password: 'guess-guess-guess' });
    for (let i = 0; i < 10; i += 1) expect((await attempt()).status).toBe(401);
    const limited = await attempt();
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('too_many_attempts');
  });
});

describe('sessions', () => {
  it('ends every session of an account when it signs out everywhere', async () => {
    const ctx = createTestContext();
    await createAccount(ctx, 'musician', 'pia@students.example');
    const phone = await signedInAgent(ctx, 'pia@students.example');
    const laptop = await signedInAgent(ctx, 'pia@students.example');
    expect((await laptop.get('/api/me')).status).toBe(200);
    await phone.post('/api/auth/revoke-sessions').set('origin', 'http://ritorno.test').send({}).expect(200);
    expect((await laptop.get('/api/me')).status).toBe(401);
    expect((await phone.get('/api/me')).status).toBe(401);
  });

  it('expires a session after its lifetime', async () => {
    const ctx = createTestContext();
    await createAccount(ctx, 'musician', 'pia@students.example');
    const agent = await signedInAgent(ctx, 'pia@students.example');
    const { session } = await import('@/server/db/schema');
    ctx.db.update(session).set({ expiresAt: new Date(Date.now() - 1000) }).run();
    expect((await agent.get('/api/me')).status).toBe(401);
  });
});
