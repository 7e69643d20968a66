import express from 'express';
import { createApp } from '../server/app';
import { createAuth } from '../server/auth';
import { openDatabase } from '../server/db/client';
import { memoryStorage } from '../server/lib/storage';
import { BENCH_NOW, BENCH_SECRET } from './clinic-db';

/**
 * The server under test, in its own process so that the load generator does not share its event loop:
 * the app on the generated clinic database (with the web export when WEB_DIR is set) and, on the next
 * port, a bare Express endpoint returning a fixed JSON, the baseline. Loopback only; stopped by run.ts.
 */
const port = Number(process.env.BENCH_PORT ?? 8161);
const dbFile = process.env.BENCH_DB ?? '';
const publicUrl = `http://127.0.0.1:${port}`;
const db = openDatabase(dbFile);
const env = { PUBLIC_URL: publicUrl, NODE_ENV: 'test' as const, AUTH_SECRET: BENCH_SECRET, SIGN_IN_LIMIT_PER_MINUTE: 10_000 };
const mailer = { send: async () => undefined };
const app = createApp({ db, auth: createAuth({ db, env, mailer }), mailer, env, now: () => BENCH_NOW, storage: memoryStorage(), webDir: process.env.WEB_DIR });

const bare = express();
const fixed = { date: '2027-03-01', kind: 'playing', sessions: [{ index: 0, minutes: 20 }] };
bare.get('/fixed', (_req, res) => {
  res.json(fixed);
});

app.listen(port, '127.0.0.1', () => {
  bare.listen(port + 1, '127.0.0.1', () => console.log('ready'));
});
