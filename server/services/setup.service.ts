import { randomUUID } from 'node:crypto';
import { and, asc, eq } from 'drizzle-orm';
import type { CreateSetupItem, SetupItem, UpdateSetupItem } from '../../shared/schemas/setup';
import type { Db } from '../db/client';
import { setupItems } from '../db/schema';
import { notFound } from '../lib/http-error';
import { ownMusician } from './own-musician';

type SetupRow = typeof setupItems.$inferSelect;

const toItem = (row: SetupRow): SetupItem => ({
  id: row.id,
  kind: row.kind,
  label: row.label,
  instructions: row.instructions,
  active: row.active,
  createdAt: row.createdAt.toISOString(),
});

/** The clinician's checklist, active and inactive; the musician sees active ones on Today. */
export function listSetup(db: Db, clinicianId: string, musicianId: string): SetupItem[] {
  ownMusician(db, clinicianId, musicianId);
  return db.select().from(setupItems).where(eq(setupItems.musicianId, musicianId)).orderBy(asc(setupItems.createdAt), asc(setupItems.label)).all().map(toItem);
}

export function addSetupItem(db: Db, clinicianId: string, musicianId: string, input: CreateSetupItem, now: Date): SetupItem {
  ownMusician(db, clinicianId, musicianId);
  const row = db.insert(setupItems).values({ id: randomUUID(), musicianId, ...input, createdById: clinicianId, createdAt: now }).returning().get();
  return toItem(row);
}

function findItem(db: Db, musicianId: string, itemId: string): SetupRow {
  const row = db.select().from(setupItems).where(and(eq(setupItems.id, itemId), eq(setupItems.musicianId, musicianId))).get();
  if (!row) throw notFound('Setup item');
  return row;
}

export function updateSetupItem(db: Db, clinicianId: string, musicianId: string, itemId: string, input: UpdateSetupItem): SetupItem {
  ownMusician(db, clinicianId, musicianId);
  findItem(db, musicianId, itemId);
  return toItem(db.update(setupItems).set(input).where(eq(setupItems.id, itemId)).returning().get());
}

export function deleteSetupItem(db: Db, clinicianId: string, musicianId: string, itemId: string): void {
  ownMusician(db, clinicianId, musicianId);
  findItem(db, musicianId, itemId);
  db.delete(setupItems).where(eq(setupItems.id, itemId)).run();
}
