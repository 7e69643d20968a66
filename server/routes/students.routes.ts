import { Router } from 'express';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { listStudents } from '../services/musician.service';
import type { AppDeps } from './deps';

/** A teacher's students: only those who shared their clearance, and nothing medical. */
export function studentRoutes({ auth, db }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('teacher'));
  router.get('/', (_req, res) => {
    res.json(listStudents(db, currentUser(res.locals).id));
  });
  return router;
}
