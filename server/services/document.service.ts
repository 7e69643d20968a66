import { randomUUID } from 'node:crypto';
import { and, desc, eq } from 'drizzle-orm';
import { DOCUMENT_TYPES, type DocumentRecord, type DocumentUploadFields, type UpdateDocument } from '../../shared/schemas/document';
import type { Db } from '../db/client';
import { documents } from '../db/schema';
import { sniffDocumentType } from '../lib/file-type';
import { HttpError, notFound } from '../lib/http-error';
import type { Storage } from '../lib/storage';
import { audit } from './audit';
import { ownMusician } from './own-musician';

type DocumentRow = typeof documents.$inferSelect;

function toRecord(row: DocumentRow): DocumentRecord {
  const mimeType = DOCUMENT_TYPES.find((type) => type === row.mimeType);
  if (!mimeType) throw new Error(`Stored document ${row.id} has an unexpected type ${row.mimeType}`);
  return { id: row.id, title: row.title, fileName: row.fileName, mimeType, sizeBytes: row.sizeBytes, visibility: row.visibility, createdAt: row.createdAt.toISOString() };
}

/** The name as shown and offered on download: no folders, no control characters, at most 200 characters. */
function cleanFileName(name: string, extension: string): string {
  const base = (name.split(/[\\/]/).at(-1) ?? '').replace(/[\u0000-\u001f\u007f"]/g, '').trim().slice(0, 200);
  return base || `document.${extension}`;
}

export function listDocuments(db: Db, clinicianId: string, musicianId: string): DocumentRecord[] {
  ownMusician(db, clinicianId, musicianId);
  return db.select().from(documents).where(eq(documents.musicianId, musicianId)).orderBy(desc(documents.createdAt)).all().map(toRecord);
}

export interface UploadedFile {
  buffer: Buffer;
  originalname: string;
}

/**
 * Stores the file, then its record; if the record cannot be written the file is removed again, so a
 * refused or failed upload leaves nothing behind. The type comes from the bytes alone (415 otherwise).
 */
export async function uploadDocument(
  deps: { db: Db; storage: Storage }, clinicianId: string, musicianId: string, file: UploadedFile, fields: DocumentUploadFields, now: Date,
): Promise<DocumentRecord> {
  const { db, storage } = deps;
  ownMusician(db, clinicianId, musicianId);
  const type = sniffDocumentType(file.buffer);
  if (!type) {
    throw new HttpError(415, 'unsupported_type', 'Only PDF, PNG, JPEG and WebP files can be uploaded; the content of this file is none of those.');
  }
  const id = randomUUID();
  const storageKey = `${id}.${type.extension}`;
  await storage.put(storageKey, file.buffer, type.mimeType);
  try {
    const row = db.transaction((tx) => {
      const inserted = tx
        .insert(documents)
        .values({ id, musicianId, uploadedById: clinicianId, title: fields.title, fileName: cleanFileName(file.originalname, type.extension), mimeType: type.mimeType, sizeBytes: file.buffer.length, storageKey, visibility: fields.visibility, createdAt: now })
        .returning()
        .get();
      audit(tx, { actorId: clinicianId, action: 'document.uploaded', musicianId, detail: { documentId: id, visibility: fields.visibility }, at: now });
      return inserted;
    });
    return toRecord(row);
  } catch (error) {
    await storage.delete(storageKey).catch((cleanup: unknown) => console.error('[storage] could not remove', storageKey, cleanup));
    throw error;
  }
}

function findDocument(db: Db, musicianId: string, documentId: string): DocumentRow {
  const row = db.select().from(documents).where(and(eq(documents.id, documentId), eq(documents.musicianId, musicianId))).get();
  if (!row) throw notFound('Document');
  return row;
}

export function updateDocument(db: Db, clinicianId: string, musicianId: string, documentId: string, input: UpdateDocument, now: Date): DocumentRecord {
  ownMusician(db, clinicianId, musicianId);
  findDocument(db, musicianId, documentId);
  return db.transaction((tx) => {
    const row = tx.update(documents).set(input).where(eq(documents.id, documentId)).returning().get();
    audit(tx, { actorId: clinicianId, action: 'document.updated', musicianId, detail: { documentId, ...input }, at: now });
    return toRecord(row);
  });
}

export async function deleteDocument(deps: { db: Db; storage: Storage }, clinicianId: string, musicianId: string, documentId: string, now: Date): Promise<void> {
  const { db, storage } = deps;
  ownMusician(db, clinicianId, musicianId);
  const row = findDocument(db, musicianId, documentId);
  db.transaction((tx) => {
    tx.delete(documents).where(eq(documents.id, documentId)).run();
    audit(tx, { actorId: clinicianId, action: 'document.deleted', musicianId, detail: { documentId, title: row.title }, at: now });
  });
  // The record is gone first, so nobody can reach the file even if removing it fails.
  await storage.delete(row.storageKey).catch((error: unknown) => console.error('[storage] could not remove', row.storageKey, error));
}

export interface DocumentFile {
  document: DocumentRecord;
  body: Buffer;
}

async function readFile(deps: { db: Db; storage: Storage }, row: DocumentRow, actorId: string, now: Date): Promise<DocumentFile> {
  const body = await deps.storage.get(row.storageKey);
  audit(deps.db, { actorId, action: 'document.downloaded', musicianId: row.musicianId, detail: { documentId: row.id }, at: now });
  return { document: toRecord(row), body };
}

export async function clinicianDownload(deps: { db: Db; storage: Storage }, clinicianId: string, musicianId: string, documentId: string, now: Date): Promise<DocumentFile> {
  ownMusician(deps.db, clinicianId, musicianId);
  return readFile(deps, findDocument(deps.db, musicianId, documentId), clinicianId, now);
}

/** A musician sees only the documents shared with them; a private one answers 404 like a missing one. */
export function listSharedDocuments(db: Db, musicianId: string): DocumentRecord[] {
  return db
    .select()
    .from(documents)
    .where(and(eq(documents.musicianId, musicianId), eq(documents.visibility, 'shared')))
    .orderBy(desc(documents.createdAt))
    .all()
    .map(toRecord);
}

export async function musicianDownload(deps: { db: Db; storage: Storage }, musician: { id: string; userId: string }, documentId: string, now: Date): Promise<DocumentFile> {
  const row = findDocument(deps.db, musician.id, documentId);
  if (row.visibility !== 'shared') throw notFound('Document');
  return readFile(deps, row, musician.userId, now);
}
