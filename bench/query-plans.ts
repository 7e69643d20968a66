import request from 'supertest';
import { createApp } from '../server/app';
import { createAuth } from '../server/auth';
import { openDatabase } from '../server/db/client';
import { memoryStorage } from '../server/lib/storage';
import { BENCH_NOW, BENCH_PASSWORD, BENCH_SECRET, clinicianEmail, musicianEmail } from './clinic-db';

interface Captured { sql: string; args: unknown[] }

// Tables this small are read whole faster than through an index; anything bigger must be searched.
const SMALL_TABLE = 1000;

/**
 * Serves the caseload, a musician record and today's session once each, in process, recording every
 * statement SQLite is given (ours, Drizzle's and better-auth's), then asks SQLite how it runs each one.
 * A SCAN of a table over SMALL_TABLE rows fails the check.
 */
export async function checkQueryPlans(dbFile: string): Promise<{ statements: number; scans: string[] }> {
  const db = openDatabase(dbFile);
  const sqlite = db.$client;
  const env = { PUBLIC_URL: 'http://127.0.0.1', NODE_ENV: 'test' as const, AUTH_SECRET: BENCH_SECRET, SIGN_IN_LIMIT_PER_MINUTE: 10_000 };
  const mailer = { send: async () => undefined };
  const app = createApp({ db, auth: createAuth({ db, env, mailer }), mailer, env, now: () => BENCH_NOW, storage: memoryStorage() });
  const clinician = request.agent(app);
  const musician = request.agent(app);
  await clinician.post('/api/auth/sign-in/email').send({ email: clinicianEmail(0), password: BENCH_PASSWORD }).expect(200);
  await musician.post('/api/auth/sign-in/email').send({ email: musicianEmail(0), password: BENCH_PASSWORD }).expect(200);

  const captured: Captured[] = [];
  const prepare = sqlite.prepare.bind(sqlite);
  const recording = (source: string) => {
    const statement = prepare(source);
    const proxy: typeof statement = new Proxy(statement, {
      get(target, key) {
        const value: unknown = Reflect.get(target, key, target);
        if (typeof value !== 'function') return value;
        if (key === 'all' || key === 'get' || key === 'run' || key === 'iterate') {
          return (...args: unknown[]) => {
            captured.push({ sql: source, args });
            return value.apply(target, args);
          };
        }
        if (key === 'raw' || key === 'pluck' || key === 'expand' || key === 'safeIntegers') {
          return (...args: unknown[]) => {
            value.apply(target, args);
            return proxy;
          };
        }
        return value.bind(target);
      },
    });
    return proxy;
  };
  sqlite.prepare = recording as typeof sqlite.prepare;
  const caseload = (await clinician.get('/api/musicians').expect(200)).body as { id: string }[];
  await clinician.get(`/api/musicians/${caseload[0]?.id ?? ''}`).expect(200);
  await musician.get('/api/today').expect(200);
  sqlite.prepare = prepare;

  const sizes = new Map<string, number>();
  const rowsIn = (table: string) => {
    // A name that is no table (a subquery's alias) counts as small.
    if (!sizes.has(table)) {
      try {
        sizes.set(table, (prepare(`select count(*) as n from "${table}"`).get() as { n: number }).n);
      } catch {
        sizes.set(table, 0);
      }
    }
    return sizes.get(table) ?? 0;
  };
  const scans = new Set<string>();
  const distinct = new Map(captured.map((c) => [c.sql, c]));
  for (const { sql, args } of distinct.values()) {
    const plan = prepare(`EXPLAIN QUERY PLAN ${sql}`).all(...args) as { detail: string }[];
    for (const { detail } of plan) {
      const table = /^SCAN (\w+)/.exec(detail)?.[1];
      if (table && rowsIn(tableOf(sql, table)) > SMALL_TABLE) scans.add(`${detail} in: ${sql.slice(0, 120)}`);
    }
  }
  sqlite.close();
  return { statements: distinct.size, scans: [...scans] };
}

/** EXPLAIN names a table by its alias when it has one: find the real table behind `alias`. */
function tableOf(sql: string, alias: string): string {
  const aliased = new RegExp(`(?:from|join)\\s+"?(\\w+)"?\\s+(?:as\\s+)?"?${alias}"?(?:\\s|$|,)`, 'i').exec(sql);
  return aliased?.[1] ?? alias;
}
