import { randomUUID } from 'node:crypto';
import { desc, eq } from 'drizzle-orm';
import type { ClinicalNote, CheckInRow, MusicianProfile, UpdateMusicianProfile } from '../../shared/schemas/record';
import type { Db } from '../db/client';
import { checkIns, clinicalNotes, musicians, user } from '../db/schema';
import { audit } from './audit';
import { overThreshold } from './check-in.service';
import { ownMusician, type MusicianRow } from './own-musician';
import { loadActivePlan } from './plan.service';

function toProfile(row: MusicianRow): MusicianProfile {
  return {
    id: row.id,
    name: row.name,
    email: row.email,
    instrument: row.instrument,
    joined: row.userId !== null,
    createdAt: row.createdAt.toISOString(),
    problem: { region: row.problemRegion, side: row.problemSide, onset: row.problemOnset, summary: row.problemSummary },
  };
}

export function getProfile(db: Db, clinicianId: string, musicianId: string): MusicianProfile {
  return toProfile(ownMusician(db, clinicianId, musicianId));
}

/** Changes only the fields sent; `null` or an empty string clears a presenting-problem field. */
export function updateProfile(db: Db, clinicianId: string, musicianId: string, input: UpdateMusicianProfile, now: Date): MusicianProfile {
  ownMusician(db, clinicianId, musicianId);
  const problem = input.problem ?? {};
  const changes = {
    name: input.name,
    instrument: input.instrument,
    problemRegion: problem.region,
    problemSide: problem.side,
    problemOnset: problem.onset,
    problemSummary: problem.summary,
  };
  const row = db.transaction((tx) => {
    const updated = tx.update(musicians).set(changes).where(eq(musicians.id, musicianId)).returning().get();
    audit(tx, { actorId: clinicianId, action: 'profile.updated', musicianId, detail: { fields: Object.keys(changes).filter((k) => changes[k as keyof typeof changes] !== undefined) }, at: now });
    return updated;
  });
  return toProfile(row);
}

export function listNotes(db: Db, clinicianId: string, musicianId: string): ClinicalNote[] {
  ownMusician(db, clinicianId, musicianId);
  return db
    .select({ note: clinicalNotes, authorName: user.name })
    .from(clinicalNotes)
    .innerJoin(user, eq(user.id, clinicalNotes.authorId))
    .where(eq(clinicalNotes.musicianId, musicianId))
    .orderBy(desc(clinicalNotes.createdAt))
    .all()
    .map(({ note, authorName }) => ({ id: note.id, body: note.body, authorName, createdAt: note.createdAt.toISOString() }));
}

export function addNote(db: Db, clinician: { id: string; name: string }, musicianId: string, body: string, now: Date): ClinicalNote {
  ownMusician(db, clinician.id, musicianId);
  const id = randomUUID();
  db.transaction((tx) => {
    tx.insert(clinicalNotes).values({ id, musicianId, authorId: clinician.id, body, createdAt: now }).run();
    audit(tx, { actorId: clinician.id, action: 'note.added', musicianId, detail: { noteId: id }, at: now });
  });
  return { id, body, authorName: clinician.name, createdAt: now.toISOString() };
}

/** Every check-in, newest first, judged against the active plan's thresholds (no plan: BAPAM's "no pain"). */
export function checkInHistory(db: Db, clinicianId: string, musicianId: string): CheckInRow[] {
  ownMusician(db, clinicianId, musicianId);
  const threshold = loadActivePlan(db, musicianId)?.settings.painThreshold ?? { session: 0, nextMorning: 0 };
  return db
    .select()
    .from(checkIns)
    .where(eq(checkIns.musicianId, musicianId))
    .orderBy(desc(checkIns.date), desc(checkIns.recordedAt))
    .all()
    .map(({ id, payload, recordedAt }) => {
      const session = payload.kind === 'session' ? payload : null;
      return {
        id,
        date: payload.date,
        kind: payload.kind,
        sessionIndex: session ? session.sessionIndex : null,
        minutesPlayed: session ? session.minutesPlayed : null,
        effort: session?.effort ?? null,
        highestPain: session ? Math.max(0, ...session.gates.map((g) => g.pain)) : payload.kind === 'session' ? 0 : payload.pain,
        overThreshold: overThreshold(payload, threshold),
        gates: session ? session.gates : [],
        redFlags: payload.redFlags,
        note: payload.note ?? null,
        recordedAt: recordedAt.toISOString(),
      };
    });
}
