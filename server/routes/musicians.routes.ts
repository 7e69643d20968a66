import { Router } from 'express';
import { z } from 'zod';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { getOwnMusician, listCaseload } from '../services/musician.service';
import type { AppDeps } from './deps';

const IdParams = z.object({ id: z.string().min(1).max(100) });

/** The clinician's caseload; musicians join it by invitation (invitations.routes.ts). */
export function musicianRoutes({ auth, db, now }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('clinician'));

  router.get('/', (_req, res) => {
    res.json(listCaseload(db, currentUser(res.locals).id, now()));
  });

  router.get('/:id', (req, res) => {
    const { id } = IdParams.parse(req.params);
    res.json(getOwnMusician(db, currentUser(res.locals).id, id, now()));
  });

  return router;
}
