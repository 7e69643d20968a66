import { createHash, randomUUID } from 'node:crypto';
import { and, desc, eq, like } from 'drizzle-orm';
import { clearanceFingerprint, teacherClearance, type PlanSummary } from '../../shared/scheduler';
import type { Db } from '../db/client';
import { clearanceShares, musicians, notifications, user } from '../db/schema';
import type { Mailer } from '../lib/mailer';
import { clearanceChangeMail } from '../lib/mail-templates';
import { clearanceOf } from './student.service';

const KIND = 'clearance';

/**
 * Tells a musician's teachers when what they may play changes (a stage passed, a step back, a stop),
 * in non-medical words. The last fingerprint sent is kept in the notifications table; the first look
 * only records a baseline. Returns how many teachers were e-mailed.
 */
export async function syncClearanceNotices(
  deps: { db: Db; mailer: Mailer; publicUrl: string },
  musicianId: string,
  now: Date,
  /** The plan's summary when the caller has just computed it (saves a replay of the history). */
  summary?: PlanSummary,
): Promise<number> {
  const { db } = deps;
  const musician = db.select().from(musicians).where(eq(musicians.id, musicianId)).get();
  if (!musician) return 0;
  const teachers = db
    .select({ email: user.email, name: user.name })
    .from(clearanceShares)
    .innerJoin(user, eq(user.id, clearanceShares.teacherId))
    .where(eq(clearanceShares.musicianId, musicianId))
    .all();
  if (teachers.length === 0) return 0;
  // Only what a teacher may see goes into the view: never the whole musician row.
  const student = { id: musician.id, name: musician.name, instrument: musician.instrument };
  const view = summary ? teacherClearance(student, summary) : clearanceOf(db, student, now);
  const fingerprint = createHash('sha256').update(clearanceFingerprint(view)).digest('hex').slice(0, 16);
  const last = db
    .select({ dedupeKey: notifications.dedupeKey })
    .from(notifications)
    .where(and(eq(notifications.musicianId, musicianId), eq(notifications.kind, KIND), like(notifications.dedupeKey, `${KIND}:%`)))
    .orderBy(desc(notifications.sentAt))
    .get();
  if (last?.dedupeKey.split(':')[2] === fingerprint) return 0;
  db.insert(notifications)
    .values({ id: randomUUID(), musicianId, kind: KIND, dedupeKey: `${KIND}:${musicianId}:${fingerprint}:${now.getTime()}`, recipient: teachers.map((t) => t.email).join(','), sentAt: now })
    .onConflictDoNothing()
    .run();
  if (!last) return 0;
  for (const teacher of teachers) {
    await deps.mailer.send(clearanceChangeMail({ to: teacher.email, teacherName: teacher.name, view, link: `${deps.publicUrl}/students/${musicianId}` }));
  }
  return teachers.length;
}

/** Runs the sync for every musician who shares with a teacher (the periodic job). */
export async function syncAllClearanceNotices(deps: { db: Db; mailer: Mailer; publicUrl: string }, now: Date): Promise<number> {
  const shared = deps.db.selectDistinct({ musicianId: clearanceShares.musicianId }).from(clearanceShares).all();
  let sent = 0;
  for (const { musicianId } of shared) sent += await syncClearanceNotices(deps, musicianId, now);
  return sent;
}
