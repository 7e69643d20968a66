import { asc, eq } from 'drizzle-orm';
import type { CaseloadEntry } from '../../shared/schemas/musician';
import type { Db } from '../db/client';
import { musicians, user } from '../db/schema';
import { notFound } from '../lib/http-error';
import { getCaseloadEntry } from './caseload.service';

/** A clinician reaches only their own musicians: anyone else's answers 404, as if it did not exist. */
export function getOwnMusician(db: Db, clinicianId: string, musicianId: string, now: Date): CaseloadEntry {
  return getCaseloadEntry(db, clinicianId, musicianId, now);
}

export function getMusicianByUser(db: Db, userId: string) {
  const found = db
    .select({ musician: musicians, clinicianName: user.name })
    .from(musicians)
    .innerJoin(user, eq(user.id, musicians.clinicianId))
    .where(eq(musicians.userId, userId))
    .get();
  if (!found) throw notFound('Musician record');
  return found;
}
