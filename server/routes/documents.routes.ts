import { Router, type RequestHandler, type Response } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { DocumentUploadFieldsSchema, MAX_DOCUMENT_BYTES, UpdateDocumentSchema, type UpdateDocument } from '../../shared/schemas/document';
import { HttpError } from '../lib/http-error';
import { currentUser } from '../middleware/auth';
import { validateBody } from '../middleware/validate';
import { clinicianDownload, deleteDocument, listDocuments, updateDocument, uploadDocument, type DocumentFile } from '../services/document.service';
import { ownMusician } from '../services/own-musician';
import type { AppDeps } from './deps';
import { paramsOf } from './params';

const UploadSchema = DocumentUploadFieldsSchema.extend({
  file: z.custom<Express.Multer.File>((value) => value !== undefined, { error: 'Choose a file to upload.' }),
});

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_DOCUMENT_BYTES, files: 1, fields: 10 } }).single('file');

/** Reads one file into memory, refusing anything over the limit with 413 before it is stored anywhere. */
export const receiveFile: RequestHandler = (req, res, next) => {
  upload(req, res, (error: unknown) => {
    if (error instanceof multer.MulterError) {
      if (error.code === 'LIMIT_FILE_SIZE') {
        next(new HttpError(413, 'file_too_large', `The file is larger than ${MAX_DOCUMENT_BYTES / 1024 / 1024} MB. Nothing was stored; reduce it and try again.`));
        return;
      }
      next(new HttpError(400, 'bad_upload', `The upload could not be read (${error.message}). Send one file in the field "file".`));
      return;
    }
    next(error);
  });
};

export function sendDocument(res: Response, file: DocumentFile): void {
  res.type(file.document.mimeType).attachment(file.document.fileName).set('cache-control', 'private, no-store').send(file.body);
}

/** Documents of one musician for their clinician (/api/musicians/:id/documents). */
export function documentRoutes({ db, storage, now }: AppDeps): Router {
  const router = Router({ mergeParams: true });
  const ids = (req: Parameters<typeof paramsOf>[0], locals: Express.Locals) => ({ clinicianId: currentUser(locals).id, musicianId: paramsOf(req, 'id').id });

  // DocumentRecord[], newest first
  router.get('/', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(listDocuments(db, clinicianId, musicianId));
  });

  // multipart/form-data: file, title, visibility -> 201 DocumentRecord; 413 over 10 MB; 415 unless PDF/PNG/JPEG/WebP by content.
  const ownerFirst: RequestHandler = (req, res, next) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    ownMusician(db, clinicianId, musicianId);
    next();
  };
  router.post('/', ownerFirst, receiveFile, async (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    const { file, ...fields } = UploadSchema.parse({ ...req.body, file: req.file });
    res.status(201).json(await uploadDocument({ db, storage }, clinicianId, musicianId, file, fields, now()));
  });

  // UpdateDocument -> DocumentRecord (title, visibility)
  router.patch('/:documentId', validateBody(UpdateDocumentSchema), (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(updateDocument(db, clinicianId, musicianId, paramsOf(req, 'documentId').documentId, req.body as UpdateDocument, now()));
  });

  router.get('/:documentId/file', async (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    sendDocument(res, await clinicianDownload({ db, storage }, clinicianId, musicianId, paramsOf(req, 'documentId').documentId, now()));
  });

  router.delete('/:documentId', async (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    await deleteDocument({ db, storage }, clinicianId, musicianId, paramsOf(req, 'documentId').documentId, now());
    res.status(204).end();
  });

  return router;
}
