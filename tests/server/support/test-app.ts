import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { createApp } from '@/server/app';
import { createAuth, type Auth } from '@/server/auth';
import { migrateDatabase, openDatabase, type Db } from '@/server/db/client';
import type { Mailer, OutgoingMail } from '@/server/lib/mailer';
import { memoryStorage } from '@/server/lib/storage';
import type { Role } from '@/shared/schemas/role';
import type { Express } from 'express';

export const PUBLIC_URL = 'http://ritorno.test';
export const PASSWORD = 'correct-horse-battery';

export interface TestContext {
  app: Express;
  db: Db;
  auth: Auth;
  outbox: OutgoingMail[];
  clock: { now: Date };
  storage: ReturnType<typeof memoryStorage>;
}

/** A fresh app on a fresh database (in memory unless a file is given), with a mailer that records what it would send. */
export function createTestContext(options: { devMailbox?: boolean; failMail?: boolean; file?: string } = {}): TestContext {
  const db = openDatabase(options.file ?? ':memory:');
  migrateDatabase(db);
  const outbox: OutgoingMail[] = [];
  const mailer: Mailer = {
    async send(mail) {
      if (options.failMail) throw new Error('SMTP is down');
      outbox.push(mail);
    },
  };
  const env = { PUBLIC_URL, NODE_ENV: 'test' as const, AUTH_SECRET: 'test-secret-test-secret-test-secret-1234' };
  const auth = createAuth({ db, env, mailer });
  const clock = { now: new Date('2027-03-01T09:00:00Z') };
  const storage = memoryStorage();
  const app = createApp({
    db,
    auth,
    mailer,
    env,
    now: () => clock.now,
    storage,
    devMailbox: options.devMailbox ? () => [] : undefined,
  });
  return { app, db, auth, outbox, clock, storage };
}

/** Creates an account with a role directly on the server, as the seed and invitations do. */
export async function createAccount(ctx: TestContext, role: Role, email: string, name = email.split('@')[0] ?? email) {
  const created = await ctx.auth.api.createUser({ body: { email, password: PASSWORD, name, role } });
  return created.user.id;
}

/** A supertest agent that keeps the session cookie after signing in. */
export async function signedInAgent(ctx: TestContext, email: string, password = PASSWORD): Promise<TestAgent> {
  const agent = request.agent(ctx.app);
  const response = await agent.post('/api/auth/sign-in/email').send({ email, password });
  if (response.status !== 200) throw new Error(`sign-in failed for ${email}: ${response.status} ${response.text}`);
  return agent;
}

/** The link in the newest e-mail to `to`, or an error naming what was sent. */
export function linkInMailTo(outbox: OutgoingMail[], to: string): string {
  const mail = [...outbox].reverse().find((m) => m.to === to);
  const link = mail?.text.match(/https?:\/\/\S+/)?.[0];
  if (!link) throw new Error(`no link mailed to ${to}; outbox: ${outbox.map((m) => m.to).join(', ')}`);
  return link;
}
