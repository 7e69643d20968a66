import { randomUUID } from 'node:crypto';
import { getVtimezoneComponent } from '@touch4it/ical-timezones';
import { TZDate } from '@date-fns/tz';
import ical, { ICalAlarmType, ICalEventStatus } from 'ical-generator';
import ICAL from 'ical.js';
import { migrateDatabase, openDatabase } from '../server/db/client';
import { demoHistory } from '../server/db/demo-history';
import { musicians, plans, user, checkIns } from '../server/db/schema';
import { REMINDER_SECONDS } from '../server/lib/calendar';
import { calendarFor } from '../server/services/calendar.service';
import { addDays, defaultPlanSettings, localDateOf } from '../shared/scheduler';
import { BENCH_NOW } from './clinic-db';
import { measure, ms, ratio, verdict, type Bench } from './harness';

interface Event { uid: string; sequence: number; start: string; end: string; allDay: boolean; rule: string | null; summary: string; description: string; cancelled: boolean }

/** A musician two weeks into a 26-week plan, with the history the engine would expect. */
function feedDatabase() {
  const db = openDatabase(':memory:');
  migrateDatabase(db);
  const today = localDateOf(BENCH_NOW, 'Europe/London');
  const startDate = addDays(today, -14);
  const settings = defaultPlanSettings({ startDate, event: { name: 'Invented summer recital', date: addDays(startDate, 26 * 7 - 1) }, targetMinutesPerDay: 150 });
  const clinicianId = randomUUID();
  const musicianId = randomUUID();
  db.insert(user).values({ id: clinicianId, name: 'Bench Clinician', email: 'c@bench.example', role: 'clinician', createdAt: BENCH_NOW, updatedAt: BENCH_NOW }).run();
  db.insert(musicians).values({ id: musicianId, clinicianId, name: 'Bench Musician', email: 'm@bench.example', instrument: 'Cello', createdAt: BENCH_NOW }).run();
  db.insert(plans).values({ id: randomUUID(), musicianId, version: 1, status: 'active', settings, createdById: clinicianId, createdAt: BENCH_NOW, activatedAt: BENCH_NOW }).run();
  demoHistory(settings, today).forEach((payload, i) =>
    db.insert(checkIns).values({ id: randomUUID(), musicianId, date: payload.date, kind: payload.kind, payload, clientKey: `h${i}`, recordedAt: BENCH_NOW }).run(),
  );
  return { db, musicianId, timeZone: settings.timeZone };
}

/** The events of our feed, read back by a reference parser, to hand to ical-generator directly. */
function eventsOf(ics: string): Event[] {
  const calendar = new ICAL.Component(ICAL.parse(ics));
  return calendar.getAllSubcomponents('vevent').map((vevent) => {
    const event = new ICAL.Event(vevent);
    return {
      uid: event.uid,
      sequence: event.sequence,
      start: event.startDate.toJSDate().toISOString(),
      end: event.endDate.toJSDate().toISOString(),
      allDay: event.startDate.isDate,
      rule: vevent.getFirstPropertyValue('rrule')?.toString() ?? null,
      summary: event.summary,
      description: event.description,
      cancelled: vevent.getFirstPropertyValue('status') === 'CANCELLED',
    };
  });
}

function direct(name: string, timeZone: string, events: Event[]): string {
  const calendar = ical({ name, timezone: { name: timeZone, generator: getVtimezoneComponent }, ttl: 3600 });
  for (const e of events) {
    const times = e.allDay
      ? { start: new Date(e.start), allDay: true, ...(e.rule ? { repeating: `RRULE:${e.rule}` } : {}) }
      : { start: new TZDate(e.start, timeZone), end: new TZDate(e.end, timeZone), timezone: timeZone };
    const created = calendar.createEvent({ id: e.uid, sequence: e.sequence, ...times, summary: e.summary, description: e.description, status: e.cancelled ? ICalEventStatus.CANCELLED : ICalEventStatus.CONFIRMED });
    if (!e.cancelled && !e.allDay) created.createAlarm({ type: ICalAlarmType.display, trigger: REMINDER_SECONDS, description: `${e.summary} in 10 minutes` });
  }
  return calendar.toString();
}

// Ours is the whole feed request minus HTTP: plan and check-ins read, progression replayed, sessions of
// every remaining day, SEQUENCE bookkeeping in SQLite, and the file written. The baseline is
// ical-generator alone writing the very same events.
export const calendarBench: Bench = {
  name: 'calendar feed',
  run: ({ quick }) => {
    const { db, musicianId, timeZone } = feedDatabase();
    const events = eventsOf(calendarFor(db, musicianId, BENCH_NOW));
    const runs = quick ? 20 : 60;
    const ours = measure(() => calendarFor(db, musicianId, BENCH_NOW), { runs, warmup: 5 });
    const baseline = measure(() => direct('Ritorno: Bench Musician', timeZone, events), { runs, warmup: 5 });
    db.$client.close();
    return [{
      area: 'calendar',
      measure: `26-week feed (${events.length} events): build p50`,
      ours: ms(ours.p50),
      baseline: `ical-generator alone ${ms(baseline.p50)}`,
      ratio: ratio(ours.p50, baseline.p50),
      budget: '< 1.5x',
      verdict: verdict(ours.p50 / baseline.p50 < 1.5),
    }];
  },
};
