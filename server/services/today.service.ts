import { and, eq, sql } from 'drizzle-orm';
import { addDays, planSummary, progressionState, sessionsForDate } from '../../shared/scheduler';
import type { Today } from '../../shared/schemas/today';
import type { Db } from '../db/client';
import { setupItems } from '../db/schema';
import { notFound } from '../lib/http-error';
import { fingerprints, musicianCache } from './caseload-cache';
import { loadActivePlan } from './plan.service';
import { toOverview } from './plan-overview';

type Programme = Omit<Today, 'setup'>;

// Replaying every check-in through the engine is most of a request's cost and the musician opens this
// screen many times a day: the result is kept under the same fingerprint as the caseload rows (their
// plan, check-ins, overrides and pieces, and the plan's local date), so any write is seen at once.
const cachedProgramme = musicianCache<Programme>();

// Setup reminders are not part of the fingerprint, so they are read on every request: by a statement
// prepared once per database, since building the query each time cost more than running it.
const prepareSetup = (db: Db) =>
  db
    .select({ id: setupItems.id, label: setupItems.label, instructions: setupItems.instructions })
    .from(setupItems)
    .where(and(eq(setupItems.musicianId, sql.placeholder('musicianId')), eq(setupItems.active, true)))
    .prepare();
const setupStatements = new WeakMap<Db, ReturnType<typeof prepareSetup>>();

function setupOf(db: Db, musicianId: string): Today['setup'] {
  let statement = setupStatements.get(db);
  if (!statement) {
    statement = prepareSetup(db);
    setupStatements.set(db, statement);
  }
  return statement.all({ musicianId });
}

/** Today's programme for a musician: the engine's sessions from the plan's current state. */
export function todayFor(db: Db, musicianId: string, now: Date): Today {
  const fingerprint = fingerprints(db, { musicianId }).get(musicianId);
  const programme = cachedProgramme(db, musicianId, fingerprint, now, () => computeProgramme(db, musicianId, now));
  return { ...programme, setup: setupOf(db, musicianId) };
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
