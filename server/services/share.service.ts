import { randomUUID } from 'node:crypto';
import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import type { CreateShare, Share } from '../../shared/schemas/share';
import type { Db } from '../db/client';
import { clearanceShares, invitations, user } from '../db/schema';
import { HttpError, notFound } from '../lib/http-error';
import { createInvitation } from './invitation.service';

/** Who sees a musician's clearance: teachers with accounts, and open invitations. */
export function listShares(db: Db, musicianId: string, now: Date): Share[] {
  const active = db
    .select({ teacherId: user.id, name: user.name, email: user.email, since: clearanceShares.createdAt })
    .from(clearanceShares)
    .innerJoin(user, eq(user.id, clearanceShares.teacherId))
    .where(eq(clearanceShares.musicianId, musicianId))
    .all()
    .map((row) => ({ ...row, status: 'active' as const, since: row.since.toISOString() }));
  const invited = db
    .select()
    .from(invitations)
    .where(and(eq(invitations.musicianId, musicianId), eq(invitations.role, 'teacher'), isNull(invitations.acceptedAt), gt(invitations.expiresAt, now)))
    .orderBy(desc(invitations.createdAt))
    .all()
    .map((row) => ({ teacherId: null, name: row.name, email: row.email, status: 'invited' as const, since: row.createdAt.toISOString() }));
  return [...active, ...invited];
}

export type ShareOutcome = { kind: 'shared'; teacherId: string } | { kind: 'invited'; token: string };

/**
 * Shares with an existing teacher account at once; otherwise invites that address as a teacher and
 * shares when they accept. An address that belongs to another kind of account is refused.
 */
export function shareWithTeacher(db: Db, musician: { id: string; userId: string }, input: CreateShare, now: Date): ShareOutcome {
  const existing = db.select({ id: user.id, role: user.role }).from(user).where(eq(user.email, input.email)).get();
  if (existing && existing.role !== 'teacher') {
    throw new HttpError(409, 'not_a_teacher', 'That address belongs to an account that is not a teacher’s.');
  }
  if (existing) {
    db.insert(clearanceShares).values({ id: randomUUID(), musicianId: musician.id, teacherId: existing.id, createdAt: now }).onConflictDoNothing().run();
    return { kind: 'shared', teacherId: existing.id };
  }
  const created = createInvitation(db, musician.userId, { role: 'teacher', name: input.name, email: input.email }, now, musician.id);
  return { kind: 'invited', token: created.token };
}

/** Stops sharing at once: the teacher's next request no longer finds the student. */
export function stopSharing(db: Db, musicianId: string, teacherId: string): void {
  const removed = db
    .delete(clearanceShares)
    .where(and(eq(clearanceShares.musicianId, musicianId), eq(clearanceShares.teacherId, teacherId)))
    .run();
  if (removed.changes === 0) throw notFound('Share');
}

/** Withdraws open invitations to an address (sharing stopped before the teacher joined). */
export function withdrawInvitation(db: Db, musicianId: string, email: string): void {
  const removed = db
    .delete(invitations)
    .where(and(eq(invitations.musicianId, musicianId), eq(invitations.role, 'teacher'), eq(invitations.email, email), isNull(invitations.acceptedAt)))
    .run();
  if (removed.changes === 0) throw notFound('Invitation');
}
