import { desc, eq } from 'drizzle-orm';
import type { AuditEntry } from '../../shared/schemas/audit';
import type { Db } from '../db/client';
import { auditEvents, musicians, user } from '../db/schema';

// The newest entries are what people look for; older ones stay in the database and the backups.
const TRAIL_LIMIT = 500;

function trail(db: Db, musicianId: string | null): AuditEntry[] {
  const query = db
    .select({ event: auditEvents, actorName: user.name, musicianName: musicians.name })
    .from(auditEvents)
    .leftJoin(user, eq(user.id, auditEvents.actorId))
    .leftJoin(musicians, eq(musicians.id, auditEvents.musicianId));
  const rows = (musicianId ? query.where(eq(auditEvents.musicianId, musicianId)) : query).orderBy(desc(auditEvents.at)).limit(TRAIL_LIMIT).all();
  return rows.map(({ event, actorName, musicianName }) => ({
    id: event.id,
    at: event.at.toISOString(),
    actorName,
    action: event.action,
    musicianId: event.musicianId,
    musicianName,
    detail: event.detail,
  }));
}

/** The trail of one musician's record (the caller has already been checked as their clinician). */
export const musicianTrail = (db: Db, musicianId: string) => trail(db, musicianId);

/** Every record's trail, for an admin. */
export const fullTrail = (db: Db) => trail(db, null);
