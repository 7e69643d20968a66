import { createHash, randomBytes } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { addDays, progressionState, restDayRecurrence, sessionsForRange, type DaySession } from '../../shared/scheduler';
import type { Db } from '../db/client';
import { calendarEventVersions, calendarFeeds, musicians } from '../db/schema';
import { writeCalendar, type CalendarSession } from '../lib/calendar';
import { notFound } from '../lib/http-error';
import { describeSession, sessionTitle } from './session-words';
import { loadActivePlan } from './plan.service';

// Past sessions stay in the feed for two weeks so a subscribed calendar keeps recent history.
const PAST_DAYS = 14;

const hashOf = (text: string) => createHash('sha256').update(text).digest('hex');

function sessionEnd(session: DaySession): string {
  const last = session.items.at(-1);
  const minutes = last ? last.startMinute + last.minutes : session.playingMinutes;
  return new Date(Date.parse(session.startsAt) + Math.max(minutes, 1) * 60_000).toISOString();
}

/**
 * The musician's sessions as calendar events with stable UIDs. A session whose content changed since it
 * was last published gets SEQUENCE + 1; one that disappeared (a step back, a stop) is published as
 * CANCELLED with SEQUENCE + 1, so subscribed calendars update instead of duplicating (RFC 5545 3.8.7.4).
 */
export function calendarFor(db: Db, musicianId: string, now: Date): string {
  const musician = db.select().from(musicians).where(eq(musicians.id, musicianId)).get();
  const loaded = loadActivePlan(db, musicianId);
  if (!musician || !loaded) throw notFound('Active plan');
  const { settings } = loaded;
  const state = progressionState({ ...loaded, today: now });
  const from = [settings.startDate, addDays(state.today, -PAST_DAYS)].sort().at(-1) ?? settings.startDate;
  const days = sessionsForRange(settings, state, from, settings.event.date);
  const rest = restDayRecurrence(settings);
  const restEvent = rest
    ? [{ uid: `${musicianId}.rest-days@ritorno`, startsAt: `${rest.firstDate}T00:00:00.000Z`, endsAt: `${rest.firstDate}T00:00:00.000Z`, summary: 'Rest day: no playing', description: 'A planned day off playing. Rest is part of the plan.', allDayRule: rest.rule }]
    : [];
  const current: Omit<CalendarSession, 'sequence' | 'cancelled'>[] = [...restEvent, ...days.flatMap((day) =>
    day.sessions.map((session) => ({
      uid: `${musicianId}.${day.date}.${session.index}@ritorno`,
      startsAt: session.startsAt,
      endsAt: sessionEnd(session),
      summary: sessionTitle(session, day.sessions.length),
      description: describeSession(session, settings.painThreshold.session),
    })),
  )];
  const sessions: CalendarSession[] = db.transaction((tx) => {
    const published = new Map(
      tx.select().from(calendarEventVersions).where(eq(calendarEventVersions.musicianId, musicianId)).all().map((row) => [row.uid, row]),
    );
    const out: CalendarSession[] = [];
    for (const event of current) {
      const contentHash = hashOf(JSON.stringify([event.startsAt, event.endsAt, event.summary, event.description, event.allDayRule]));
      const before = published.get(event.uid);
      published.delete(event.uid);
      let sequence = before?.sequence ?? 0;
      if (!before) {
        tx.insert(calendarEventVersions).values({ uid: event.uid, musicianId, contentHash, startsAt: event.startsAt, endsAt: event.endsAt, summary: event.summary, sequence, updatedAt: now }).run();
      } else if (before.contentHash !== contentHash || before.cancelled) {
        sequence += 1;
        tx.update(calendarEventVersions)
          .set({ contentHash, startsAt: event.startsAt, endsAt: event.endsAt, summary: event.summary, sequence, cancelled: false, updatedAt: now })
          .where(eq(calendarEventVersions.uid, event.uid))
          .run();
      }
      out.push({ ...event, sequence, cancelled: false });
    }
    for (const gone of published.values()) {
      if (gone.startsAt < `${from}T00:00` || gone.uid.endsWith('.rest-days@ritorno')) continue;
      const sequence = gone.cancelled ? gone.sequence : gone.sequence + 1;
      if (!gone.cancelled) {
        tx.update(calendarEventVersions).set({ cancelled: true, sequence, updatedAt: now }).where(eq(calendarEventVersions.uid, gone.uid)).run();
      }
      out.push({ uid: gone.uid, sequence, startsAt: gone.startsAt, endsAt: gone.endsAt, summary: gone.summary, description: 'This session was taken out of the plan.', cancelled: true });
    }
    return out;
  });
  return writeCalendar({ name: `Ritorno: ${musician.name}`, timeZone: settings.timeZone, sessions });
}

/** Makes a new secret feed link; the old one stops working at once. Only the token's hash is kept. */
export function regenerateFeed(db: Db, musicianId: string, now: Date): string {
  const token = randomBytes(24).toString('base64url');
  db.insert(calendarFeeds)
    .values({ musicianId, tokenHash: hashOf(token), createdAt: now })
    .onConflictDoUpdate({ target: calendarFeeds.musicianId, set: { tokenHash: hashOf(token), createdAt: now } })
    .run();
  return token;
}

export function feedStatus(db: Db, musicianId: string): { createdAt: string } | null {
  const row = db.select().from(calendarFeeds).where(eq(calendarFeeds.musicianId, musicianId)).get();
  return row ? { createdAt: row.createdAt.toISOString() } : null;
}

export function musicianOfFeed(db: Db, token: string): string {
  const row = db.select().from(calendarFeeds).where(eq(calendarFeeds.tokenHash, hashOf(token))).get();
  if (!row) throw notFound('Calendar feed');
  return row.musicianId;
}
