import { createHash } from 'node:crypto';
import type { Statement } from 'better-sqlite3';
import { addDays, planSummary, progressionState, sessionsForDate } from '../../shared/scheduler';
import type { Today } from '../../shared/schemas/today';
import type { Db } from '../db/client';
import { keptWhileUnchanged } from '../db/data-generation';
import { notFound } from '../lib/http-error';
import { FINGERPRINT_COLUMNS, fingerprintOf, musicianCache, type FingerprintRow } from './caseload-cache';
import { loadActivePlan } from './plan.service';
import { toOverview } from './plan-overview';

type Programme = Omit<Today, 'setup'>;

/** Today's answer as sent: the JSON body and its entity tag. */
export interface TodayResponse {
  body: Buffer;
  etag: string;
}

// Replaying every check-in through the engine is most of a request's cost and the musician opens this
// screen many times a day: the answer is kept, serialised, under the caseload rows' fingerprint (their
// plan, check-ins, overrides and pieces, and the plan's local date) plus the setup reminders, all read
// by one indexed statement whenever the database's generation has moved, so any write through any path
// is seen at once.
const KEY = `select ${FINGERPRINT_COLUMNS},
    (select json_group_array(json_array(s.id, s.label, s.instructions))
       from setup_items s where s.musician_id = m.id and s.active = 1) as setup
  from musicians m where m.user_id = ?`;
const SETUP = 'select id, label, instructions from setup_items where musician_id = ? and active = 1 order by rowid';

type KeyRow = FingerprintRow & { setup: string };
interface Statements {
  key: Statement<[string], KeyRow>;
  setup: Statement<[string], Today['setup'][number]>;
}
const statements = new WeakMap<Db, Statements>();

function statementsFor(db: Db): Statements {
  let found = statements.get(db);
  if (!found) {
    found = { key: db.$client.prepare<[string], KeyRow>(KEY), setup: db.$client.prepare<[string], Today['setup'][number]>(SETUP) };
    statements.set(db, found);
  }
  return found;
}

const cachedResponse = musicianCache<TodayResponse>();

// While the database's generation stands still, a user's musician and fingerprint cannot have changed.
const keptKey = keptWhileUnchanged<{ musicianId: string; fingerprint: string }>(20_000);

function keyOf(db: Db, userId: string) {
  return keptKey(db, userId, () => {
    const row = statementsFor(db).key.get(userId);
    if (!row) throw notFound('Musician record');
    return { musicianId: row.id, fingerprint: `${fingerprintOf(row)}${row.setup}` };
  });
}

/** The signed-in musician's programme for today, ready to send; 404 without a musician record. */
export function todayResponseFor(db: Db, userId: string, now: Date): TodayResponse {
  const { musicianId, fingerprint } = keyOf(db, userId);
  return cachedResponse(db, musicianId, fingerprint, now, () => {
    const { part, timeZone } = computeProgramme(db, musicianId, now);
    const today: Today = { ...part, setup: statementsFor(db).setup.all(musicianId) };
    const body = Buffer.from(JSON.stringify(today));
    // The same weak tag Express would compute, once per change instead of once per request.
    const hash = createHash('sha1').update(body).digest('base64').slice(0, 27);
    return { part: { body, etag: `W/"${body.length.toString(16)}-${hash}"` }, timeZone };
  });
}

function computeProgramme(db: Db, musicianId: string, now: Date): { part: Programme; timeZone: string } {
  const loaded = loadActivePlan(db, musicianId);
  if (!loaded) throw notFound('Active plan');
  const { settings, checkIns } = loaded;
  const input = { ...loaded, today: now };
  // One replay serves both the day's sessions and the summary.
  const state = progressionState(input);
  const date = state.today;
  const programme = sessionsForDate(settings, state, date);
  const summary = planSummary(input, state);
  const doneToday = new Set(
    checkIns.filter((c) => c.kind === 'session' && c.date === date).map((c) => (c.kind === 'session' ? c.sessionIndex : -1)),
  );
  const ended = state.sessionEndedOn === date;
  const yesterday = addDays(date, -1);
  const playedYesterday = checkIns.some((c) => c.kind === 'session' && c.date === yesterday && c.minutesPlayed > 0);
  const answeredThisMorning = checkIns.some((c) => c.kind === 'next_morning' && c.date === date);
  const cleared = summary.repertoire.filter((entry) => entry.cleared);
  const part: Programme = {
    date,
    kind: ended ? 'ended' : programme.kind,
    notes: ended ? ['A pain gate ended today’s playing. Rest, and let your clinician know how it settles.'] : programme.notes,
    overview: toOverview(loaded.plan, summary),
    sessions: ended
      ? []
      : programme.sessions.map((session) => ({ ...session, done: doneToday.has(session.index) })),
    pieces: cleared.map((entry) => ({
      id: entry.piece.id ?? entry.piece.title,
      title: entry.piece.title,
      composer: entry.piece.composer,
      tier: entry.piece.tier,
      passages: entry.piece.passages.map((passage) => ({ ...passage, cleared: entry.passagesCleared })),
    })),
    painThreshold: settings.painThreshold,
    maxBurstMinutes: settings.maxBurstMinutes,
    morningCheckFor: settings.requireNextMorningCheck && playedYesterday && !answeredThisMorning ? yesterday : null,
  };
  return { part, timeZone: settings.timeZone };
}
