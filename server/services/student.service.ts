import { and, asc, eq } from 'drizzle-orm';
import { planSummary, teacherClearance } from '../../shared/scheduler';
import type { StudentClearance, StudentSummary } from '../../shared/schemas/clearance';
import type { Db } from '../db/client';
import { clearanceShares, musicians } from '../db/schema';
import { notFound } from '../lib/http-error';
import { loadActivePlan } from './plan.service';

type MusicianRow = typeof musicians.$inferSelect;

/** The teacher view of one musician, from the engine's summary; a musician without a plan is "paused". */
export function clearanceOf(db: Db, musician: Pick<MusicianRow, 'id' | 'name' | 'instrument'>, now: Date): StudentClearance {
  const student = { id: musician.id, name: musician.name, instrument: musician.instrument };
  const loaded = loadActivePlan(db, musician.id);
  if (!loaded) {
    return {
      ...student,
      asOf: now.toISOString().slice(0, 10),
      readiness: 'paused',
      event: null,
      limits: { minutesPerDay: 0, longestBlockMinutes: 0, restMinutes: 0, sessionsPerDay: 0 },
      pieces: [],
      programme: { total: 0, cleared: 0, fullyCleared: 0 },
    };
  }
  return teacherClearance(student, planSummary({ ...loaded, today: now }));
}

function sharedMusicians(db: Db, teacherId: string) {
  return db
    .select({ id: musicians.id, name: musicians.name, instrument: musicians.instrument })
    .from(clearanceShares)
    .innerJoin(musicians, eq(musicians.id, clearanceShares.musicianId))
    .where(eq(clearanceShares.teacherId, teacherId))
    .orderBy(asc(musicians.name))
    .all();
}

export function listStudents(db: Db, teacherId: string, now: Date): StudentSummary[] {
  return sharedMusicians(db, teacherId).map((musician) => {
    const { id, name, instrument, readiness, event, asOf } = clearanceOf(db, musician, now);
    return { id, name, instrument, readiness, event, asOf };
  });
}

/** One student's clearance, only while they share it with this teacher (404 otherwise). */
export function studentClearance(db: Db, teacherId: string, musicianId: string, now: Date): StudentClearance {
  const musician = db
    .select({ id: musicians.id, name: musicians.name, instrument: musicians.instrument })
    .from(clearanceShares)
    .innerJoin(musicians, eq(musicians.id, clearanceShares.musicianId))
    .where(and(eq(clearanceShares.teacherId, teacherId), eq(clearanceShares.musicianId, musicianId)))
    .get();
  if (!musician) throw notFound('Student');
  return clearanceOf(db, musician, now);
}
