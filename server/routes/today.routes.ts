import { Router } from 'express';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { getMusicianByUser } from '../services/musician.service';
import { todayFor } from '../services/today.service';
import type { AppDeps } from './deps';

/** The musician's programme for today, from the engine and the plan's current state. */
export function todayRoutes({ auth, db, now }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('musician'));
  router.get('/', (_req, res) => {
    const { musician } = getMusicianByUser(db, currentUser(res.locals).id);
    res.json(todayFor(db, musician.id, now()));
  });
  return router;
}
