import ICAL from 'ical.js';
import request from 'supertest';
import { progressionState, sessionItemLine, sessionsForRange } from '@/shared/scheduler';
import { musicianWithPlan } from './support/plan-fixture';
import { createTestContext, signedInAgent, type TestContext } from './support/test-app';

// Exported calendars are read back with ical.js, a general-purpose iCalendar parser (checks.md).
function parse(ics: string) {
  const calendar = new ICAL.Component(ICAL.parse(ics));
  const events = calendar.getAllSubcomponents('vevent').map((vevent) => ({ vevent, event: new ICAL.Event(vevent) }));
  return { calendar, events };
}

const byUid = (events: ReturnType<typeof parse>['events']) => new Map(events.map(({ event, vevent }) => [event.uid, vevent]));

describe('calendar export and feed', () => {
  let ctx: TestContext;
  let fixture: Awaited<ReturnType<typeof musicianWithPlan>>;
  beforeEach(async () => {
    ctx = createTestContext();
    // A plan across the end of British Summer Time (31 Oct 2027) in London.
    ctx.clock.now = new Date('2027-10-25T08:00:00Z');
    fixture = await musicianWithPlan(ctx, { startDate: '2027-10-25', event: { name: 'Autumn recital', date: '2027-11-20' } });
  });

  it("writes one event per engine session at the plan's local times, with a VTIMEZONE and a reminder", async () => {
    const musician = await signedInAgent(ctx, fixture.email);
    const response = await musician.get('/api/calendar/download.ics');
    expect(response.headers['content-type']).toContain('text/calendar');
    const { calendar, events: all } = parse(response.text);
    const events = all.filter(({ event }) => !event.isRecurring());

    const state = progressionState({ settings: fixture.settings, checkIns: [], overrides: [], today: '2027-10-25' });
    const planned = sessionsForRange(fixture.settings, state, '2027-10-25', '2027-11-20').flatMap((day) => day.sessions.map((s) => ({ day, s })));
    expect(events).toHaveLength(planned.length);
    expect(calendar.getFirstSubcomponent('vtimezone')?.getFirstPropertyValue('tzid')).toBe('Europe/London');

    for (const { day, s } of planned) {
      const vevent = byUid(events).get(`${fixture.musicianId}.${day.date}.${s.index}@ritorno`);
      expect(vevent).toBeDefined();
      const start = vevent?.getFirstProperty('dtstart');
      expect(start?.getParameter('tzid')).toBe('Europe/London');
      const local = start?.getFirstValue() as ICAL.Time;
      // Local wall time is the session's start time on both sides of the clock change.
      expect(local.toString().slice(0, 16)).toBe(`${day.date}T${s.startTime}`);
      expect(new Date(local.toJSDate()).toISOString()).toBe(s.startsAt);
      // Each block in the same words as on the Today screen (shared/scheduler/session-words.ts).
      const firstPlay = s.items.find((item) => item.kind === 'play');
      if (firstPlay) expect(vevent?.getFirstPropertyValue('description')).toContain(sessionItemLine(firstPlay, fixture.settings.painThreshold.session));
      // RFC 5545 3.6.6: a DISPLAY alarm has ACTION, TRIGGER and DESCRIPTION.
      const alarm = vevent?.getFirstSubcomponent('valarm');
      expect(alarm?.getFirstPropertyValue('action')).toBe('DISPLAY');
      expect(String(alarm?.getFirstPropertyValue('trigger'))).toBe('-PT10M');
      expect(alarm?.getFirstPropertyValue('description')).toEqual(expect.any(String));
    }
    // 10:00 London is 09:00 UTC in October's summer time and 10:00 UTC after 31 October.
    expect(planned.find(({ day }) => day.date === '2027-10-25')?.s.startsAt).toBe('2027-10-25T09:00:00.000Z');
    expect(planned.find(({ day }) => day.date === '2027-11-01')?.s.startsAt).toBe('2027-11-01T10:00:00.000Z');
  });

  it('keeps UIDs and raises SEQUENCE for changed sessions after a step back', async () => {
    // Two weeks of clean playing, then a painful gate.
    ctx.clock.now = new Date('2027-10-25T08:00:00Z');
    const musician = await signedInAgent(ctx, fixture.email);
    const feedUrl = new URL((await musician.post('/api/calendar/feed')).body.url);
    const firstDay = '2027-10-25';
    const days = ['2027-10-25', '2027-10-26', '2027-10-27', '2027-10-28', '2027-10-29', '2027-10-30', '2027-11-01'];
    for (const [i, date] of days.entries()) {
      ctx.clock.now = new Date(`${date}T20:00:00Z`);
      if (i > 0) await musician.post('/api/check-ins').send({ clientKey: `morning-${date}`, checkIn: { kind: 'next_morning', date, pain: 0 } });
      await musician
        .post('/api/check-ins')
        .send({ clientKey: `session-${date}`, checkIn: { kind: 'session', date, gates: [{ position: 'before', pain: 0 }], effort: 3, minutesPlayed: 10 } });
    }
    const before = byUid(parse((await request(ctx.app).get(feedUrl.pathname)).text).events);
    ctx.clock.now = new Date('2027-11-02T20:00:00Z');
    await musician.post('/api/check-ins').send({ clientKey: 'morning-2027-11-02', checkIn: { kind: 'next_morning', date: '2027-11-02', pain: 0 } });
    const pain = await musician.post('/api/check-ins').send({
      clientKey: 'session-2027-11-02',
      checkIn: { kind: 'session', date: '2027-11-02', gates: [{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 4 }], effort: 5, minutesPlayed: 5 },
    });
    expect(pain.body.overview.status).toBe('stepped_back');
    const after = byUid(parse((await request(ctx.app).get(feedUrl.pathname)).text).events);

    expect(after.has(`${fixture.musicianId}.${firstDay}.0@ritorno`)).toBe(true);
    const changed = [...after.entries()].filter(([uid, vevent]) => {
      const old = before.get(uid);
      return old && old.getFirstPropertyValue('description') !== vevent.getFirstPropertyValue('description');
    });
    expect(changed.length).toBeGreaterThan(0);
    for (const [uid, vevent] of changed) {
      expect(Number(vevent.getFirstPropertyValue('sequence'))).toBeGreaterThan(Number(before.get(uid)?.getFirstPropertyValue('sequence')));
    }
    const unchanged = [...after.entries()].filter(([uid, vevent]) => before.get(uid)?.getFirstPropertyValue('description') === vevent.getFirstPropertyValue('description'));
    for (const [uid, vevent] of unchanged) {
      expect(vevent.getFirstPropertyValue('sequence')).toBe(before.get(uid)?.getFirstPropertyValue('sequence'));
    }
  });

  it("answers 404 to a replaced feed link, and one musician's link never shows another's sessions", async () => {
    const other = await musicianWithPlan(ctx, { startDate: '2027-10-25', event: { name: 'Autumn recital', date: '2027-11-20' } }, 'otto');
    const pia = await signedInAgent(ctx, fixture.email);
    const otto = await signedInAgent(ctx, other.email);
    const oldUrl = new URL((await pia.post('/api/calendar/feed')).body.url);
    const newUrl = new URL((await pia.post('/api/calendar/feed')).body.url);
    expect((await request(ctx.app).get(oldUrl.pathname)).status).toBe(404);
    expect((await request(ctx.app).get('/api/calendar/feeds/not-a-token.ics')).status).toBe(404);
    const piaFeed = (await request(ctx.app).get(newUrl.pathname)).text;
    expect(piaFeed).toContain(fixture.musicianId);
    expect(piaFeed).not.toContain(other.musicianId);
    const ottoUrl = new URL((await otto.post('/api/calendar/feed')).body.url);
    expect((await request(ctx.app).get(ottoUrl.pathname)).text).not.toContain(fixture.musicianId);
  });
});

describe('weekly rest days in the calendar', () => {
  it('publishes rest days as one weekly recurrence whose expansion matches the engine day by day', async () => {
    const ctx = createTestContext();
    ctx.clock.now = new Date('2027-10-25T08:00:00Z');
    const fixture = await musicianWithPlan(ctx, { startDate: '2027-10-25', event: { name: 'Autumn recital', date: '2027-11-20' }, restDaysPerWeek: 2 });
    const musician = await signedInAgent(ctx, fixture.email);
    const { events } = parse((await musician.get('/api/calendar/download.ics')).text);
    const rest = events.find(({ event }) => event.uid === `${fixture.musicianId}.rest-days@ritorno`);
    expect(rest?.event.summary).toBe('Rest day: no playing');
    expect(rest?.event.isRecurring()).toBe(true);
    // Expanded by ical.js, the reference parser, not by our code.
    const iterator = rest?.event.iterator();
    const restDates: string[] = [];
    for (let next = iterator?.next(); next; next = iterator?.next()) restDates.push(next.toString().slice(0, 10));

    const programmes = sessionsForRange(fixture.settings, null, '2027-10-25', '2027-11-20');
    expect(restDates).toEqual(programmes.filter((day) => day.kind === 'rest').map((day) => day.date));
    expect(restDates.length).toBeGreaterThanOrEqual(6);
  });
});

describe('text in calendar files', () => {
  it('escapes what users typed so it cannot break out of its property (RFC 5545 3.3.11)', async () => {
    const ctx = createTestContext();
    ctx.clock.now = new Date('2027-10-25T08:00:00Z');
    const hostile = 'Eve; Mallory,\nEND:VEVENT\nBEGIN:VEVENT\nSUMMARY:injected';
    const fixture = await musicianWithPlan(ctx, { startDate: '2027-10-25', event: { name: 'Autumn recital', date: '2027-11-20' } });
    const { musicians } = await import('@/server/db/schema');
    const { eq } = await import('drizzle-orm');
    ctx.db.update(musicians).set({ name: hostile }).where(eq(musicians.id, fixture.musicianId)).run();
    const musician = await signedInAgent(ctx, fixture.email);
    const { calendar, events } = parse((await musician.get('/api/calendar/download.ics')).text);
    expect(calendar.getFirstPropertyValue('x-wr-calname')).toBe(`Ritorno: ${hostile.replaceAll('\n', ' ')}`);
    expect(calendar.getAllSubcomponents('vcalendar')).toEqual([]);
    expect(events.some(({ event }) => event.summary === 'injected')).toBe(false);
  });
});
