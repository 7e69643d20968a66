import { and, asc, eq } from 'drizzle-orm';
import type { CaseloadEntry } from '../../shared/schemas/musician';
import type { Db } from '../db/client';
import { musicians, user } from '../db/schema';
import { notFound } from '../lib/http-error';
import { planOverview, planOverviews } from './plan.service';

type MusicianRow = typeof musicians.$inferSelect;

function toCaseloadEntry(row: MusicianRow, plan: CaseloadEntry['plan']): CaseloadEntry {
  return {
    id: row.id,
    name: row.name,
    email: row.email,
    instrument: row.instrument,
    joined: row.userId !== null,
    createdAt: row.createdAt.toISOString(),
    plan,
  };
}

export function listCaseload(db: Db, clinicianId: string, now: Date): CaseloadEntry[] {
  const rows = db.select().from(musicians).where(eq(musicians.clinicianId, clinicianId)).orderBy(asc(musicians.name)).all();
  const overviews = planOverviews(db, rows.map((row) => row.id), now);
  return rows.map((row) => toCaseloadEntry(row, overviews.get(row.id) ?? null));
}

/** A clinician reaches only their own musicians: anyone else's answers 404, as if it did not exist. */
export function getOwnMusician(db: Db, clinicianId: string, musicianId: string, now: Date): CaseloadEntry {
  const row = db
    .select()
    .from(musicians)
    .where(and(eq(musicians.id, musicianId), eq(musicians.clinicianId, clinicianId)))
    .get();
  if (!row) throw notFound('Musician');
  return toCaseloadEntry(row, planOverview(db, row.id, now));
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
