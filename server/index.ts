import type { Server } from 'node:http';
import { createApp } from './app';
import { isWebExport } from './middleware/web-export';
import { createAuth } from './auth';
import { migrateDatabase, openDatabase } from './db/client';
import { seedDemo } from './db/seed';
import { parseEnv } from './env';
import { startFakeSmtp, type FakeSmtp } from './lib/fake-smtp';
import { startWeeklySummaryJob } from './jobs/weekly-summary';
import { createSmtpMailer } from './lib/mailer';
import { createStorage } from './lib/storage';
import { syncAllClearanceNotices } from './services/clearance-notice.service';

async function main() {
  const env = parseEnv();
  const db = openDatabase(env.DATABASE_PATH);
  migrateDatabase(db);

  let fakeSmtp: FakeSmtp | undefined;
  let smtpUrl = env.SMTP_URL;
  if (!smtpUrl) {
    fakeSmtp = await startFakeSmtp(env.FAKE_SMTP_PORT);
    smtpUrl = `smtp://127.0.0.1:${fakeSmtp.port}`;
  }
  const mailer = createSmtpMailer(smtpUrl, env.MAIL_FROM);
  const auth = createAuth({ db, env, mailer });

  const seeded = env.SEED_DEMO ? await seedDemo(db, auth, new Date()) : null;

  const app = createApp({
    db,
    auth,
    mailer,
    env,
    now: () => new Date(),
    storage: createStorage(env),
    devMailbox: fakeSmtp ? () => fakeSmtp.messages() : undefined,
    webDir: env.WEB_DIR,
  });
  // Clearance changes with the calendar too (a stage passed overnight): look every hour, and at boot,
  // which also records the baseline that later changes are compared with.
  const clearanceDeps = { db, mailer, publicUrl: env.PUBLIC_URL };
  const syncClearance = () =>
    syncAllClearanceNotices(clearanceDeps, new Date()).catch((error: unknown) => console.error('[clearance] sync failed:', error));
  void syncClearance();
  const clearanceTimer = setInterval(syncClearance, 60 * 60 * 1000);

  const summaryJob = startWeeklySummaryJob({ db, mailer, publicUrl: env.PUBLIC_URL, pattern: env.SUMMARY_CRON, timeZone: env.SUMMARY_TIME_ZONE });
  const server: Server = app.listen(env.PORT, env.HOST, () => {
    console.log(`\nRitorno is running at ${env.PUBLIC_URL}`);
    if (!isWebExport(env.WEB_DIR)) console.log(`Web app: no export in ${env.WEB_DIR} (\`npm start\` builds one); serving the API only.`);
    console.log(fakeSmtp ? `Mail: local fake SMTP on port ${fakeSmtp.port}; read it as the admin under Mailbox.` : 'Mail: sent through SMTP_URL.');
    if (seeded) {
      console.log(`\nDemo accounts (password for all: ${seeded.password}):`);
      for (const account of seeded.accounts) console.log(`  ${account.role.padEnd(10)} ${account.email}  (${account.name})`);
    }
  });

  const shutdown = (signal: string) => {
    console.log(`\n${signal}: closing.`);
    clearInterval(clearanceTimer);
    summaryJob.stop();
    server.close(() => {
      void fakeSmtp?.close();
      db.$client.close();
      process.exit(0);
    });
    setTimeout(() => process.exit(1), 5000);
  };
  process.on('SIGTERM', () => shutdown('SIGTERM'));
  process.on('SIGINT', () => shutdown('SIGINT'));
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
