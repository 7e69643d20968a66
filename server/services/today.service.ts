import { and, eq } from 'drizzle-orm';
import { addDays, planSummary, progressionState, sessionsForDate } from '../../shared/scheduler';
import type { Today } from '../../shared/schemas/today';
import type { Db } from '../db/client';
import { setupItems } from '../db/schema';
import { notFound } from '../lib/http-error';
import { loadActivePlan } from './plan.service';
import { toOverview } from './plan-overview';

/** Today's programme for a musician: the engine's sessions from the plan's current state. */
export function todayFor(db: Db, musicianId: string, now: Date): Today {
  const loaded = loadActivePlan(db, musicianId);
  if (!loaded) throw notFound('Active plan');
  const { settings, checkIns } = loaded;
  const state = progressionState({ ...loaded, today: now });
  const date = state.today;
  const programme = sessionsForDate(settings, state, date);
  const summary = planSummary({ ...loaded, today: now });
  const doneToday = new Set(
    checkIns.filter((c) => c.kind === 'session' && c.date === date).map((c) => (c.kind === 'session' ? c.sessionIndex : -1)),
  );
  const ended = state.sessionEndedOn === date;
  const yesterday = addDays(date, -1);
  const playedYesterday = checkIns.some((c) => c.kind === 'session' && c.date === yesterday && c.minutesPlayed > 0);
  const answeredThisMorning = checkIns.some((c) => c.kind === 'next_morning' && c.date === date);
  const cleared = summary.repertoire.filter((entry) => entry.cleared);
  return {
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
    setup: db
      .select({ id: setupItems.id, label: setupItems.label, instructions: setupItems.instructions })
      .from(setupItems)
      .where(and(eq(setupItems.musicianId, musicianId), eq(setupItems.active, true)))
      .all(),
    painThreshold: settings.painThreshold,
    maxBurstMinutes: settings.maxBurstMinutes,
    morningCheckFor: settings.requireNextMorningCheck && playedYesterday && !answeredThisMorning ? yesterday : null,
  };
}
