import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { fromDay, isoWeekday, localDateOf, toDay } from '../../shared/scheduler';
import type { SummarySent } from '../../shared/schemas/summary';
import type { Db } from '../db/client';
import { musicians, notifications, user } from '../db/schema';
import { weeklySummaryMail } from '../lib/clinic-mail';
import type { Mailer } from '../lib/mailer';
import { listCaseload } from './caseload.service';

/** ISO 8601 week of a date, e.g. "2027-W09": the week belongs to the year of its Thursday. */
export function isoWeek(date: string): string {
  const day = toDay(date);
  const thursday = day - isoWeekday(day) + 4;
  const year = fromDay(thursday).slice(0, 4);
  const week = Math.floor((thursday - toDay(`${year}-01-01`)) / 7) + 1;
  return `${year}-W${String(week).padStart(2, '0')}`;
}

/** `timeZone` decides which week a summary belongs to (SUMMARY_TIME_ZONE, the clinic's zone). */
type SummaryDeps = { db: Db; mailer: Mailer; publicUrl: string; timeZone: string };
type Clinician = { id: string; name: string; email: string };

/**
 * Sends one clinician's caseload summary. The notifications table keeps one row per clinician per ISO
 * week: the scheduled run skips a week already sent; "send now" (`force`) always sends and marks the
 * week as sent. A failed send removes the mark it made, so the next run tries again.
 */
export async function sendSummary(deps: SummaryDeps, clinician: Clinician, now: Date, force: boolean): Promise<SummarySent> {
  const { db } = deps;
  const week = isoWeek(localDateOf(now, deps.timeZone));
  const entries = listCaseload(db, clinician.id, now, { sort: 'alerts' });
  const dedupeKey = `weekly-summary:${clinician.id}:${week}`;
  const marked = db
    .insert(notifications)
    .values({ id: randomUUID(), kind: 'weekly_summary', dedupeKey, recipient: clinician.email, sentAt: now })
    .onConflictDoNothing()
    .run().changes > 0;
  const result = { week, musicianCount: entries.length, to: clinician.email };
  if (!marked && !force) return { ...result, sent: false };
  try {
    await deps.mailer.send(
      weeklySummaryMail({ to: clinician.email, clinicianName: clinician.name, week, entries, link: `${deps.publicUrl}/caseload` }),
    );
  } catch (error) {
    if (marked) db.delete(notifications).where(eq(notifications.dedupeKey, dedupeKey)).run();
    throw error;
  }
  return { ...result, sent: true };
}

/** The scheduled run: every clinician with at least one musician, once per week each. */
export async function sendWeeklySummaries(deps: SummaryDeps, now: Date): Promise<SummarySent[]> {
  const clinicians = deps.db
    .selectDistinct({ id: user.id, name: user.name, email: user.email, banned: user.banned })
    .from(user)
    .innerJoin(musicians, eq(musicians.clinicianId, user.id))
    .where(eq(user.role, 'clinician'))
    .all()
    .filter((c) => !c.banned);
  const results: SummarySent[] = [];
  for (const clinician of clinicians) {
    try {
      results.push(await sendSummary(deps, clinician, now, false));
    } catch (error) {
      console.error(`[summary] weekly summary to ${clinician.email} not sent:`, error);
    }
  }
  return results;
}
