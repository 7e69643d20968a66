import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import { createAuth } from '../server/auth';
import { migrateDatabase, openDatabase } from '../server/db/client';
import { demoHistory } from '../server/db/demo-history';
import { addDays, defaultPlanSettings, localDateOf, type CheckIn, type PlanSettings } from '../shared/scheduler';

/**
 * A generated clinic: every clinician has the same number of musicians, every musician an active plan,
 * three pieces, a setup reminder and the same number of check-ins. Rows go in with prepared statements,
 * one transaction per batch, straight into SQLite: the API would take hours for a million check-ins.
 */
export interface ClinicScale {
  clinicians: number;
  musicians: number;
  checkIns: number;
}

export const BENCH_PASSWORD = 'bench-password-2026';
export const BENCH_SECRET = 'bench-secret-bench-secret-bench-secret-0000';
export const BENCH_URL = 'http://127.0.0.1';
/** The fixed clock every bench runs at, so figures do not drift with the date. */
export const BENCH_NOW = new Date('2027-03-01T09:00:00Z');

// Invented syllables; any name they make is made up.
const FIRST = ['Ala', 'Bren', 'Cor', 'Dal', 'Eri', 'Fen', 'Gil', 'Hal', 'Ivo', 'Jor', 'Kel', 'Lom'];
const LAST = ['dra', 'vik', 'moro', 'sel', 'tane', 'quin', 'bastro', 'lenne', 'rud', 'ovar', 'pell', 'zan'];
const INSTRUMENTS = ['Violin', 'Viola', 'Cello', 'Flute', 'Clarinet', 'Piano', 'Guitar', 'Horn'];
const nameOf = (i: number) => `${FIRST[i % 12]}${LAST[Math.floor(i / 12) % 12]} ${FIRST[Math.floor(i / 144) % 12]}${LAST[(i * 7) % 12]}`;

export const clinicianEmail = (i: number) => `clinician${i}@bench.example`;
export const musicianEmail = (i: number) => `musician${i}@bench.example`;

/** A few plan variants (start dates a few days apart), each with an engine-made history of `perMusician` check-ins. */
function variants(perMusician: number): { settings: PlanSettings; history: CheckIn[] }[] {
  const today = localDateOf(BENCH_NOW, 'Europe/London');
  return [0, 3, 6, 9].map((shift) => {
    // Each playing day brings about two check-ins (session and next morning): start far enough back.
    const startDate = addDays(today, -Math.ceil(perMusician * 0.62) - shift);
    const settings = defaultPlanSettings({ startDate, event: { name: 'Invented spring concert', date: addDays(today, 120) }, targetMinutesPerDay: 120 });
    const history = demoHistory(settings, today, [{ playingDaysAgo: 12 + shift, afterBlock: 1, pain: 4 }]);
    while (history.length < perMusician) history.push({ kind: 'pain_report', date: today, pain: 1, redFlags: [] });
    return { settings, history: history.slice(0, perMusician) };
  });
}

/** Builds the clinic into a fresh SQLite file (overwritten); returns how long it took. */
export async function generateClinic(file: string, scale: ClinicScale): Promise<{ seconds: number; bytes: number }> {
  const started = performance.now();
  for (const suffix of ['', '-wal', '-shm']) fs.rmSync(file + suffix, { force: true });
  const db = openDatabase(file);
  migrateDatabase(db);
  const sqlite = db.$client;
  // One real account through better-auth gives a password hash every generated account can share.
  const auth = createAuth({ db, env: { AUTH_SECRET: BENCH_SECRET, PUBLIC_URL: BENCH_URL, NODE_ENV: 'test' }, mailer: { send: async () => undefined } });
  await auth.api.createUser({ body: { email: clinicianEmail(0), password: BENCH_PASSWORD, name: nameOf(0), role: 'clinician' } });
  const hash = (sqlite.prepare('select password from account').get() as { password: string }).password;
  const firstClinician = (sqlite.prepare('select id from user').get() as { id: string }).id;
  sqlite.pragma('synchronous = OFF');

  const insertUser = sqlite.prepare('insert into user (id, name, email, email_verified, role, banned, created_at, updated_at) values (?, ?, ?, 1, ?, 0, ?, ?)');
  const insertAccount = sqlite.prepare("insert into account (id, account_id, provider_id, user_id, password, created_at, updated_at) values (?, ?, 'credential', ?, ?, ?, ?)");
  const insertMusician = sqlite.prepare('insert into musicians (id, clinician_id, user_id, name, email, instrument, created_at) values (?, ?, ?, ?, ?, ?, ?)');
  const insertPlan = sqlite.prepare("insert into plans (id, musician_id, version, status, settings, created_by_id, created_at, activated_at) values (?, ?, 1, 'active', ?, ?, ?, ?)");
  const insertPiece = sqlite.prepare('insert into pieces (id, musician_id, title, composer, tier, passages, on_programme, created_at) values (?, ?, ?, ?, ?, ?, ?, ?)');
  const insertSetup = sqlite.prepare("insert into setup_items (id, musician_id, kind, label, instructions, active, created_by_id, created_at) values (?, ?, 'stand_height', ?, '', 1, ?, ?)");
  const insertCheckIn = sqlite.prepare('insert into check_ins (id, musician_id, date, kind, payload, client_key, recorded_at) values (?, ?, ?, ?, ?, ?, ?)');
  const at = BENCH_NOW.getTime();

  const addUser = (id: string, name: string, email: string, role: string) => {
    insertUser.run(id, name, email, role, at, at);
    insertAccount.run(randomUUID(), id, id, hash, at, at);
  };
  sqlite.transaction(() => {
    for (let i = 1; i < scale.clinicians; i += 1) addUser(randomUUID(), nameOf(i), clinicianEmail(i), 'clinician');
  })();
  const clinicianIds = (sqlite.prepare("select id from user where role = 'clinician' order by email").all() as { id: string }[]).map((r) => r.id);
  clinicianIds.sort((a, b) => (a === firstClinician ? -1 : b === firstClinician ? 1 : 0));

  const perMusician = Math.floor(scale.checkIns / scale.musicians);
  const plans = variants(perMusician).map((v) => ({ ...v, json: JSON.stringify(v.settings), payloads: v.history.map((c) => JSON.stringify(c)) }));
  const passages = JSON.stringify([{ bars: '12-20', demands: ['speed'] }]);
  const BATCH = 100;
  for (let from = 0; from < scale.musicians; from += BATCH) {
    sqlite.transaction(() => {
      for (let i = from; i < Math.min(scale.musicians, from + BATCH); i += 1) {
        const userId = randomUUID();
        const musicianId = randomUUID();
        const clinicianId = clinicianIds[i % clinicianIds.length] ?? firstClinician;
        const plan = plans[i % plans.length] ?? plans[0];
        if (!plan) throw new Error('no plan variant');
        addUser(userId, nameOf(i + 1000), musicianEmail(i), 'musician');
        insertMusician.run(musicianId, clinicianId, userId, nameOf(i + 1000), musicianEmail(i), INSTRUMENTS[i % 8] ?? 'Violin', at);
        insertPlan.run(randomUUID(), musicianId, plan.json, clinicianId, at, at);
        (['easy', 'moderate', 'demanding'] as const).forEach((tier, n) =>
          insertPiece.run(randomUUID(), musicianId, `Invented study ${n + 1}`, nameOf(i + n), tier, n === 2 ? passages : '[]', n === 0 ? 1 : 0, at),
        );
        insertSetup.run(randomUUID(), musicianId, 'Footstool at the usual height', clinicianId, at);
        plan.history.forEach((checkIn, n) =>
          insertCheckIn.run(randomUUID(), musicianId, checkIn.date, checkIn.kind, plan.payloads[n], `bench-${n}`, at - (perMusician - n) * 3_600_000),
        );
      }
    })();
  }
  sqlite.pragma('synchronous = NORMAL');
  sqlite.exec('analyze');
  sqlite.close();
  return { seconds: (performance.now() - started) / 1000, bytes: fs.statSync(file).size };
}
