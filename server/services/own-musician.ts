import { and, eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { musicians } from '../db/schema';
import { notFound } from '../lib/http-error';

export type MusicianRow = typeof musicians.$inferSelect;

/**
 * The musician, if they are in this clinician's caseload. Anyone else's answers 404, as if they did
 * not exist, so one clinician cannot learn who another treats. Every clinician service starts here.
 */
export function ownMusician(db: Db, clinicianId: string, musicianId: string): MusicianRow {
  const row = db
    .select()
    .from(musicians)
    .where(and(eq(musicians.id, musicianId), eq(musicians.clinicianId, clinicianId)))
    .get();
  if (!row) throw notFound('Musician');
  return row;
}
