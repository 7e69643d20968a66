import { randomUUID } from 'node:crypto';
import { and, asc, eq } from 'drizzle-orm';
import { clearanceAt, progressionState } from '../../shared/scheduler';
import type { CreatePiece, PieceRecord, UpdatePiece } from '../../shared/schemas/repertoire';
import type { Db } from '../db/client';
import { pieces } from '../db/schema';
import { notFound } from '../lib/http-error';
import { ownMusician } from './own-musician';
import { loadActivePlan } from './plan.service';

type PieceRow = typeof pieces.$inferSelect;

/**
 * Clearance is derived from the active plan's state every time it is read, never stored: a hold or a
 * step back changes it at once, and the teacher view reads the same derivation.
 */
function withClearance(db: Db, musicianId: string, rows: PieceRow[], now: Date): PieceRecord[] {
  const loaded = loadActivePlan(db, musicianId);
  const state = loaded ? progressionState({ ...loaded, today: now }) : null;
  const stage = state && state.status !== 'stopped' ? state.stageNumber : 0;
  const clearances = loaded && state ? clearanceAt(loaded.settings, stage, rows.map((r) => ({ ...r })), state.periods) : [];
  return rows.map((row, i) => {
    const c = clearances[i];
    return {
      id: row.id,
      title: row.title,
      composer: row.composer,
      tier: row.tier,
      passages: row.passages,
      onProgramme: row.onProgramme,
      createdAt: row.createdAt.toISOString(),
      clearance: c
        ? {
            clearedFromStage: c.clearedFromStage,
            passagesFromStage: c.passagesFromStage,
            cleared: c.cleared,
            passagesCleared: c.passagesCleared,
            expectedOn: c.expectedOn,
            passagesExpectedOn: c.passagesExpectedOn,
          }
        : null,
    };
  });
}

export function listPieces(db: Db, clinicianId: string, musicianId: string, now: Date): PieceRecord[] {
  ownMusician(db, clinicianId, musicianId);
  const rows = db.select().from(pieces).where(eq(pieces.musicianId, musicianId)).orderBy(asc(pieces.title)).all();
  return withClearance(db, musicianId, rows, now);
}

function findPiece(db: Db, musicianId: string, pieceId: string): PieceRow {
  const row = db.select().from(pieces).where(and(eq(pieces.id, pieceId), eq(pieces.musicianId, musicianId))).get();
  if (!row) throw notFound('Piece');
  return row;
}

export function addPiece(db: Db, clinicianId: string, musicianId: string, input: CreatePiece, now: Date): PieceRecord {
  ownMusician(db, clinicianId, musicianId);
  const row = db.insert(pieces).values({ id: randomUUID(), musicianId, ...input, createdAt: now }).returning().get();
  return withClearance(db, musicianId, [row], now)[0] as PieceRecord;
}

export function updatePiece(db: Db, clinicianId: string, musicianId: string, pieceId: string, input: UpdatePiece, now: Date): PieceRecord {
  ownMusician(db, clinicianId, musicianId);
  findPiece(db, musicianId, pieceId);
  const row = db.update(pieces).set(input).where(eq(pieces.id, pieceId)).returning().get();
  return withClearance(db, musicianId, [row], now)[0] as PieceRecord;
}

export function deletePiece(db: Db, clinicianId: string, musicianId: string, pieceId: string): void {
  ownMusician(db, clinicianId, musicianId);
  findPiece(db, musicianId, pieceId);
  db.delete(pieces).where(eq(pieces.id, pieceId)).run();
}
