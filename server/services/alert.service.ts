import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { redFlagWords } from '../../shared/scheduler';
import type { CheckIn } from '../../shared/schemas/check-in';
import type { Db } from '../db/client';
import { musicians, notifications, user } from '../db/schema';
import type { Mailer } from '../lib/mailer';
import { checkInAlertMail } from '../lib/mail-templates';

/**
 * E-mails the clinician at once about a red flag or pain over the threshold. Each check-in alerts
 * once (the notifications table remembers), so a retried upload never mails twice.
 */
export async function alertClinician(
  deps: { db: Db; mailer: Mailer; publicUrl: string; now: Date },
  input: { musicianId: string; checkInId: string; checkIn: CheckIn; change: string | null; overThreshold: boolean },
): Promise<boolean> {
  const { db, mailer } = deps;
  const redFlags = input.checkIn.redFlags;
  if (redFlags.length === 0 && !input.overThreshold) return false;
  const target = db
    .select({ musician: musicians.name, clinicianEmail: user.email, clinicianName: user.name })
    .from(musicians)
    .innerJoin(user, eq(user.id, musicians.clinicianId))
    .where(eq(musicians.id, input.musicianId))
    .get();
  if (!target) return false;
  const dedupeKey = `check-in-alert:${input.checkInId}`;
  const inserted = db
    .insert(notifications)
    .values({ id: randomUUID(), musicianId: input.musicianId, kind: 'check_in_alert', dedupeKey, recipient: target.clinicianEmail, sentAt: deps.now })
    .onConflictDoNothing()
    .run();
  if (inserted.changes === 0) return true;
  const pain =
    input.checkIn.kind === 'next_morning'
      ? `pain ${input.checkIn.pain} the next morning`
      : input.checkIn.kind === 'pain_report'
        ? `pain ${input.checkIn.pain} reported outside a session`
        : `highest gate pain ${Math.max(0, ...input.checkIn.gates.map((gate) => gate.pain))}`;
  await mailer.send(
    checkInAlertMail({
      to: target.clinicianEmail,
      clinicianName: target.clinicianName,
      musicianName: target.musician,
      urgent: redFlags.length > 0,
      what: redFlags.length > 0 ? `${redFlagWords(redFlags)} reported (${pain})` : pain,
      date: input.checkIn.date,
      change: input.change,
      link: `${deps.publicUrl}/caseload/${input.musicianId}`,
    }),
  );
  return true;
}
