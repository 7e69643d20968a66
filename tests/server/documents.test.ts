import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { count } from 'drizzle-orm';
import { documents } from '@/server/db/schema';
import { sniffDocumentType } from '@/server/lib/file-type';
import { localDiskStorage } from '@/server/lib/storage';
import { musicianWithPlan } from './support/plan-fixture';
import { createAccount, createTestContext, signedInAgent, type TestContext } from './support/test-app';

const PDF = Buffer.from('%PDF-1.7\n1 0 obj <<>> endobj\n%%EOF\n');
const PNG = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
// A Windows executable starts with "MZ" (the DOS header).
const EXE = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(64)]);

describe('documents', () => {
  let ctx: TestContext;
  let fixture: Awaited<ReturnType<typeof musicianWithPlan>>;
  let base: string;
  beforeEach(async () => {
    ctx = createTestContext();
    fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22' });
    base = `/api/musicians/${fixture.musicianId}/documents`;
  });
  const stored = () => ({ rows: ctx.db.select({ n: count() }).from(documents).get()?.n, files: ctx.storage.keys().length });

  it('stores a PDF and gives the same bytes back to its clinician', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const uploaded = await clinician.post(base).field('title', 'Referral letter').attach('file', PDF, 'letter.pdf').expect(201);
    expect(uploaded.body).toMatchObject({ title: 'Referral letter', fileName: 'letter.pdf', mimeType: 'application/pdf', sizeBytes: PDF.length, visibility: 'private' });
    const file = await clinician.get(`${base}/${uploaded.body.id}/file`).buffer(true).expect(200);
    expect(file.headers['content-type']).toBe('application/pdf');
    expect(file.headers['content-disposition']).toContain('letter.pdf');
    expect(Buffer.compare(file.body as Buffer, PDF)).toBe(0);
    expect((await clinician.get(base)).body).toHaveLength(1);
  });

  it('refuses a 20 MB file with 413 and stores nothing', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const big = Buffer.concat([PDF, Buffer.alloc(20 * 1024 * 1024)]);
    const response = await clinician.post(base).field('title', 'Scan').attach('file', big, 'scan.pdf');
    expect(response.status).toBe(413);
    expect(response.body.error).toMatchObject({ code: 'file_too_large' });
    expect(response.body.error.message).toContain('10 MB');
    expect(stored()).toEqual({ rows: 0, files: 0 });
  });

  it('refuses a renamed executable by its content with 415 and stores nothing', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const response = await clinician.post(base).field('title', 'Handout').attach('file', EXE, { filename: 'handout.pdf', contentType: 'application/pdf' });
    expect(response.status).toBe(415);
    expect(response.body.error.code).toBe('unsupported_type');
    expect(stored()).toEqual({ rows: 0, files: 0 });
  });

  it('refuses an empty file and stores nothing', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const response = await clinician.post(base).field('title', 'Blank').attach('file', Buffer.alloc(0), 'blank.pdf');
    expect(response.status).toBeGreaterThanOrEqual(400);
    expect(response.status).toBeLessThan(500);
    expect(typeof response.body.error.message).toBe('string');
    expect(stored()).toEqual({ rows: 0, files: 0 });
  });

  it('keeps a path-traversal file name as a plain name, never as a place on disk', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const uploaded = await clinician.post(base).field('title', 'Letter').attach('file', PDF, '../../../etc/passwd.pdf').expect(201);
    expect(uploaded.body.fileName).not.toContain('/');
    expect(uploaded.body.fileName).not.toContain('..');
    const keys = ctx.storage.keys();
    expect(keys).toHaveLength(1);
    expect(keys[0]).not.toContain('..');
    expect(keys[0]).not.toContain('passwd');
  });

  it('refuses an upload without a title or a file, naming the fields', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const response = await clinician.post(base).field('visibility', 'everyone');
    expect(response.status).toBe(422);
    expect(response.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['file', 'title', 'visibility']);
    expect(stored()).toEqual({ rows: 0, files: 0 });
  });

  it('lets the musician reach shared documents only, and never a teacher', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const privateDoc = (await clinician.post(base).field('title', 'Clinical letter').attach('file', PDF, 'letter.pdf')).body;
    const sharedDoc = (await clinician.post(base).field('title', 'Setup photo').field('visibility', 'shared').attach('file', PNG, 'setup.png')).body;
    const musician = await signedInAgent(ctx, fixture.email);
    expect((await musician.get('/api/documents')).body.map((d: { id: string }) => d.id)).toEqual([sharedDoc.id]);
    expect((await musician.get(`/api/documents/${privateDoc.id}/file`)).status).toBe(404);
    const photo = await musician.get(`/api/documents/${sharedDoc.id}/file`).buffer(true).expect(200);
    expect(photo.headers['content-type']).toBe('image/png');
    await createAccount(ctx, 'teacher', 'tess@school.example');
    const teacher = await signedInAgent(ctx, 'tess@school.example');
    expect((await teacher.get(`/api/documents/${sharedDoc.id}/file`)).status).toBe(403);
    expect((await teacher.get(`${base}/${sharedDoc.id}/file`)).status).toBe(403);
    await clinician.patch(`${base}/${sharedDoc.id}`).send({ visibility: 'private' }).expect(200);
    expect((await musician.get(`/api/documents/${sharedDoc.id}/file`)).status).toBe(404);
  });

  it('removes the file from storage when the document is deleted', async () => {
    const clinician = await signedInAgent(ctx, fixture.clinicianEmail);
    const doc = (await clinician.post(base).field('title', 'Old handout').attach('file', PDF, 'old.pdf')).body;
    expect(ctx.storage.keys()).toHaveLength(1);
    await clinician.delete(`${base}/${doc.id}`).expect(204);
    expect(stored()).toEqual({ rows: 0, files: 0 });
    expect((await clinician.get(`${base}/${doc.id}/file`)).status).toBe(404);
  });
});

describe('file types and local storage', () => {
  it('tells PDF, PNG, JPEG and WebP by their first bytes and nothing else', () => {
    expect(sniffDocumentType(PDF)?.mimeType).toBe('application/pdf');
    expect(sniffDocumentType(PNG)?.mimeType).toBe('image/png');
    expect(sniffDocumentType(Buffer.from([0xff, 0xd8, 0xff, 0xe0]))?.mimeType).toBe('image/jpeg');
    expect(sniffDocumentType(Buffer.from('RIFF\x10\x00\x00\x00WEBPVP8 ', 'latin1'))?.mimeType).toBe('image/webp');
    expect(sniffDocumentType(Buffer.from('RIFF\x10\x00\x00\x00WAVEfmt ', 'latin1'))).toBeNull();
    expect(sniffDocumentType(EXE)).toBeNull();
    expect(sniffDocumentType(Buffer.alloc(0))).toBeNull();
  });

  it('keeps files on disk under server-made keys and refuses a key that leaves the folder', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ritorno-uploads-'));
    const storage = localDiskStorage(dir);
    await storage.put('0f3c2a.pdf', PDF, 'application/pdf');
    expect(Buffer.compare(await storage.get('0f3c2a.pdf'), PDF)).toBe(0);
    await expect(storage.put('../escape.pdf', PDF, 'application/pdf')).rejects.toThrow('Refusing storage key');
    await storage.delete('0f3c2a.pdf');
    expect(fs.readdirSync(dir)).toEqual([]);
  });
});
