import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { and, desc, eq } from 'drizzle-orm';
import type { CreateInvitation, Invitation, InvitationPreview } from '../../shared/schemas/invitation';
import type { Auth } from '../auth';
import type { Db } from '../db/client';
import { clearanceShares, invitations, musicians, user } from '../db/schema';
import { HttpError } from '../lib/http-error';

// Seven days: long enough to reach someone over a weekend, short enough that a stray link dies.
const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

type InvitationRow = typeof invitations.$inferSelect;

function statusOf(row: InvitationRow, now: Date): Invitation['status'] {
  if (row.acceptedAt) return 'accepted';
  return row.expiresAt.getTime() <= now.getTime() ? 'expired' : 'pending';
}

function toInvitation(row: InvitationRow, now: Date): Invitation {
  return {
    id: row.id,
    role: row.role,
    name: row.name,
    email: row.email,
    status: statusOf(row, now),
    expiresAt: row.expiresAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
  };
}

export interface CreatedInvitation {
  invitation: Invitation;
  token: string;
  musicianId: string | null;
}

/**
 * A clinician invites a musician (added to their caseload at once) or a teacher; a musician invites a
 * teacher to see their clearance (`shareMusicianId`: the share starts when the teacher accepts).
 */
export function createInvitation(
  db: Db,
  invitedById: string,
  input: CreateInvitation,
  now: Date,
  shareMusicianId: string | null = null,
): CreatedInvitation {
  const existing = db.select({ id: user.id }).from(user).where(eq(user.email, input.email)).get();
  if (existing) throw new HttpError(409, 'email_taken', 'Someone already has an account with this e-mail address.');
  const token = randomBytes(32).toString('base64url');
  return db.transaction((tx) => {
    let musicianId: string | null = null;
    if (input.role === 'musician') {
      musicianId = randomUUID();
      tx.insert(musicians)
        .values({ id: musicianId, clinicianId: invitedById, name: input.name, email: input.email, instrument: input.instrument, createdAt: now })
        .run();
    }
    const row = tx
      .insert(invitations)
      .values({
        id: randomUUID(),
        role: input.role,
        email: input.email,
        name: input.name,
        invitedById,
        musicianId: musicianId ?? shareMusicianId,
        tokenHash: hashToken(token),
        expiresAt: new Date(now.getTime() + INVITATION_LIFETIME_MS),
        createdAt: now,
      })
      .returning()
      .get();
    return { invitation: toInvitation(row, now), token, musicianId };
  });
}

export function listInvitations(db: Db, clinicianId: string, now: Date): Invitation[] {
  return db
    .select()
    .from(invitations)
    .where(eq(invitations.invitedById, clinicianId))
    .orderBy(desc(invitations.createdAt))
    .all()
    .map((row) => toInvitation(row, now));
}

function findOpenInvitation(db: Db, token: string, now: Date) {
  const found = db
    .select({ invitation: invitations, invitedBy: user.name })
    .from(invitations)
    .innerJoin(user, eq(user.id, invitations.invitedById))
    .where(eq(invitations.tokenHash, hashToken(token)))
    .get();
  if (!found) throw new HttpError(404, 'invitation_not_found', 'This invitation link is not valid. Ask your clinician for a new one.');
  const status = statusOf(found.invitation, now);
  if (status === 'accepted') throw new HttpError(410, 'invitation_used', 'This invitation has already been used. Sign in instead.');
  if (status === 'expired') throw new HttpError(410, 'invitation_expired', 'This invitation has expired. Ask your clinician for a new one.');
  return found;
}

export function previewInvitation(db: Db, token: string, now: Date): InvitationPreview {
  const { invitation, invitedBy } = findOpenInvitation(db, token, now);
  return {
    role: invitation.role,
    name: invitation.name,
    email: invitation.email,
    invitedBy,
    expiresAt: invitation.expiresAt.toISOString(),
  };
}

/** Creates the account with the chosen password and links it to the caseload entry. */
export async function acceptInvitation(db: Db, auth: Auth, token: string, password: string, now: Date) {
  const { invitation } = findOpenInvitation(db, token, now);
  const taken = db.select({ id: user.id }).from(user).where(eq(user.email, invitation.email)).get();
  if (taken) throw new HttpError(409, 'email_taken', 'An account with this e-mail address already exists. Sign in instead.');
  const created = await auth.api.createUser({
    body: { email: invitation.email, password, name: invitation.name, role: invitation.role },
  });
  db.transaction((tx) => {
    tx.update(invitations)
      .set({ acceptedAt: now })
      .where(and(eq(invitations.id, invitation.id)))
      .run();
    if (invitation.musicianId && invitation.role === 'musician') {
      tx.update(musicians).set({ userId: created.user.id }).where(eq(musicians.id, invitation.musicianId)).run();
    }
    if (invitation.musicianId && invitation.role === 'teacher') {
      tx.insert(clearanceShares)
        .values({ id: randomUUID(), musicianId: invitation.musicianId, teacherId: created.user.id, createdAt: now })
        .onConflictDoNothing()
        .run();
    }
  });
  return { email: invitation.email, role: invitation.role };
}
