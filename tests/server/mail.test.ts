import request from 'supertest';
import { createApp } from '@/server/app';
import { memoryStorage } from '@/server/lib/storage';
import { startFakeSmtp, type FakeSmtp } from '@/server/lib/fake-smtp';
import { createSmtpMailer } from '@/server/lib/mailer';
import { createAccount, createTestContext, signedInAgent } from './support/test-app';

describe('e-mail through SMTP and the development mailbox', () => {
  let fake: FakeSmtp;
  beforeAll(async () => {
    fake = await startFakeSmtp(0);
  });
  afterAll(async () => {
    await fake.close();
  });

  it('delivers a message over SMTP to the local fake, parsed', async () => {
    const mailer = createSmtpMailer(`smtp://127.0.0.1:${fake.port}`, 'Ritorno <no-reply@ritorno.test>');
    await mailer.send({ to: 'pia@students.example', subject: 'Hello Pia', text: 'Line one\nhttp://ritorno.test/x' });
    const [message] = fake.messages();
    expect(message).toMatchObject({
      to: ['pia@students.example'],
      subject: 'Hello Pia',
      text: 'Line one\nhttp://ritorno.test/x',
    });
    expect(message?.from).toContain('no-reply@ritorno.test');
  });

  it('shows the mailbox to an admin only while the fake is in use', async () => {
    const withFake = createTestContext();
    const app = createApp({
      db: withFake.db,
      auth: withFake.auth,
      mailer: { send: async () => undefined },
      env: { PUBLIC_URL: 'http://ritorno.test', NODE_ENV: 'test' },
      now: () => new Date(),
      storage: memoryStorage(),
      devMailbox: () => fake.messages(),
    });
    await createAccount(withFake, 'admin', 'admin@ritorno.example');
    const agent = request.agent(app);
    await agent.post('/api/auth/sign-in/email').send({ email: 'admin@ritorno.example', password: 'correct-horse-battery' }).expect(200);
    const list = await agent.get('/api/admin/mail');
    expect(list.body.map((m: { subject: string }) => m.subject)).toContain('Hello Pia');
    const one = await agent.get(`/api/admin/mail/${list.body[0].id}`);
    expect(one.body.subject).toBe(list.body[0].subject);
    expect((await agent.get('/api/admin/mail/unknown-id')).status).toBe(404);

    const realSmtp = createTestContext();
    await createAccount(realSmtp, 'admin', 'admin@ritorno.example');
    const admin = await signedInAgent(realSmtp, 'admin@ritorno.example');
    expect((await admin.get('/api/admin/mail')).status).toBe(404);
  });
});
