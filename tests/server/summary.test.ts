import { count } from 'drizzle-orm';
import { notifications } from '@/server/db/schema';
import { SEND_NOW_PER_HOUR } from '@/server/routes/summary.routes';
import { isoWeek, sendWeeklySummaries } from '@/server/services/summary.service';
import type { CheckIn } from '@/shared/schemas/check-in';
import { musicianWithPlan } from './support/plan-fixture';
import { createAccount, createTestContext, PUBLIC_URL, signedInAgent } from './support/test-app';

const gatePain: CheckIn = {
  kind: 'session', date: '2027-02-27', sessionIndex: 0, gates: [{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 3 }], redFlags: [], effort: 4, minutesPlayed: 5,
};

describe('weekly caseload summary', () => {
  // ISO 8601 week numbering: week 1 is the week with the year's first Thursday; weeks start on Monday.
  it('numbers weeks as ISO 8601 does, across year ends', () => {
    expect(isoWeek('2008-12-29')).toBe('2009-W01');
    expect(isoWeek('2021-01-03')).toBe('2020-W53');
    expect(isoWeek('2027-01-01')).toBe('2026-W53');
    expect(isoWeek('2027-03-01')).toBe('2027-W09');
    expect(isoWeek('2027-03-07')).toBe('2027-W09');
  });

  it('sends each clinician with musicians one summary a week, naming who needs attention', async () => {
    const ctx = createTestContext();
    const fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22' }, 'pia', [gatePain]);
    await createAccount(ctx, 'clinician', 'idle@clinic.example');
    const deps = { db: ctx.db, mailer: { send: async (mail: (typeof ctx.outbox)[number]) => void ctx.outbox.push(mail) }, publicUrl: PUBLIC_URL, timeZone: 'Europe/London' };
    const first = await sendWeeklySummaries(deps, new Date('2027-03-01T07:00:00Z'));
    expect(first).toEqual([{ sent: true, week: '2027-W09', musicianCount: 1, to: fixture.clinicianEmail }]);
    const mail = ctx.outbox.at(-1);
    expect(mail?.subject).toBe('Ritorno weekly summary 2027-W09: 1 of 1 need attention');
    expect(mail?.text).toContain('Musician pia (Viola): stage 1 of');
    expect(mail?.text).toContain('Pain over the threshold on 1 day this week');
    expect((await sendWeeklySummaries(deps, new Date('2027-03-03T07:00:00Z')))[0]?.sent).toBe(false);
    expect((await sendWeeklySummaries(deps, new Date('2027-03-08T07:00:00Z')))[0]).toMatchObject({ sent: true, week: '2027-W10' });
    expect(ctx.outbox.filter((m) => m.to === 'idle@clinic.example')).toEqual([]);
    expect(ctx.outbox).toHaveLength(2);
  });

  it("files a summary under the clinic's own week, not the UTC one", async () => {
    const ctx = createTestContext();
    await musicianWithPlan(ctx, { startDate: '2027-02-22' });
    const at = new Date('2027-03-07T23:30:00Z'); // Sunday in UTC and London, already Monday 8 March in Berlin
    const deps = (timeZone: string) => ({ db: ctx.db, mailer: { send: async () => undefined }, publicUrl: PUBLIC_URL, timeZone });
    expect((await sendWeeklySummaries(deps('Europe/London'), at))[0]?.week).toBe('2027-W09');
    expect((await sendWeeklySummaries(deps('Europe/Berlin'), at))[0]?.week).toBe('2027-W10');
  });

  it('sends a clinician their summary now, and the scheduled run then skips that week', async () => {
    const ctx = createTestContext();
    const fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22' });
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const sent = (await clinician.post('/api/summary/send-now').expect(200)).body;
    expect(sent).toEqual({ sent: true, week: '2027-W09', musicianCount: 1, to: fixture.clinicianEmail });
    await clinician.post('/api/summary/send-now').expect(200);
    expect(ctx.outbox.filter((m) => m.to === fixture.clinicianEmail)).toHaveLength(2);
    const deps = { db: ctx.db, mailer: { send: async () => undefined }, publicUrl: PUBLIC_URL, timeZone: 'Europe/London' };
    expect((await sendWeeklySummaries(deps, ctx.clock.now))[0]?.sent).toBe(false);
  });

  it('refuses a sixth summary within the hour, per clinician, without sending it', async () => {
    const ctx = createTestContext();
    const fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22' });
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    for (let i = 0; i < SEND_NOW_PER_HOUR; i++) await clinician.post('/api/summary/send-now').expect(200);
    const refused = await clinician.post('/api/summary/send-now').expect(429);
    expect(refused.body.error).toEqual({ code: 'too_many_requests', message: expect.stringContaining('five summaries') });
    expect(ctx.outbox.filter((m) => m.to === fixture.clinicianEmail)).toHaveLength(SEND_NOW_PER_HOUR);
    const other = await musicianWithPlan(ctx, { startDate: '2027-02-22' }, 'rafa');
    await (await signedInAgent(ctx, other.clinicianEmail)).post('/api/summary/send-now').expect(200);
  });

  it('answers 502 and leaves the week unsent when the e-mail cannot go out', async () => {
    const ctx = createTestContext({ failMail: true });
    const fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22' });
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const response = await clinician.post('/api/summary/send-now');
    expect(response.status).toBe(502);
    expect(response.body.error.code).toBe('mail_failed');
    expect(ctx.db.select({ n: count() }).from(notifications).get()?.n).toBe(0);
  });
});
