import { Router } from 'express';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { listSharedDocuments, musicianDownload } from '../services/document.service';
import { getMusicianByUser } from '../services/musician.service';
import type { AppDeps } from './deps';
import { sendDocument } from './documents.routes';
import { paramsOf } from './params';

/** The documents a musician's clinician shared with them (/api/documents); private ones answer 404. */
export function myDocumentRoutes({ auth, db, storage, now }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('musician'));

  // DocumentRecord[] (shared only)
  router.get('/', (_req, res) => {
    const { musician } = getMusicianByUser(db, currentUser(res.locals).id);
    res.json(listSharedDocuments(db, musician.id));
  });

  router.get('/:documentId/file', async (req, res) => {
    const me = currentUser(res.locals);
    const { musician } = getMusicianByUser(db, me.id);
    sendDocument(res, await musicianDownload({ db, storage }, { id: musician.id, userId: me.id }, paramsOf(req, 'documentId').documentId, now()));
  });

  return router;
}
