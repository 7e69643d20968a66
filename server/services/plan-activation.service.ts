import { eq } from 'drizzle-orm';
import { buildStages } from '../../shared/scheduler';
import type { ActivatedPlan } from '../../shared/schemas/plan';
import type { Db } from '../db/client';
import { musicians, user } from '../db/schema';
import { planActivatedMail } from '../lib/clinic-mail';
import type { Mailer } from '../lib/mailer';
import { activateDraft } from './plan-version.service';

/**
 * Activates a draft (one short transaction), then e-mails the musician outside it: a mail failure is
 * reported as `emailSent: false` and never undoes the activation.
 */
export async function activateAndNotify(
  deps: { db: Db; mailer: Mailer; publicUrl: string }, clinicianId: string, musicianId: string, planId: string, now: Date,
): Promise<ActivatedPlan> {
  const { db } = deps;
  const { version, supersededId } = activateDraft(db, clinicianId, musicianId, planId, now);
  const musician = db.select({ name: musicians.name, email: musicians.email }).from(musicians).where(eq(musicians.id, musicianId)).get();
  const clinician = db.select({ name: user.name }).from(user).where(eq(user.id, clinicianId)).get();
  const first = buildStages(version.settings)[0];
  let emailSent = false;
  if (musician) {
    try {
      await deps.mailer.send(
        planActivatedMail({
          to: musician.email,
          musicianName: musician.name,
          clinicianName: clinician?.name ?? 'Your clinician',
          version: version.version,
          startDate: version.settings.startDate,
          event: version.settings.event,
          firstStage: first ? { minutesPerDay: first.minutesPerDay, blockMinutes: first.blockMinutes, restMinutes: first.restMinutes } : null,
          link: `${deps.publicUrl}/today`,
        }),
      );
      emailSent = true;
    } catch (error) {
      console.error('[mail] plan activation not sent:', error);
    }
  }
  return { ...version, supersededId, emailSent };
}
