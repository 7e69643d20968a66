import { Router } from 'express';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { todayResponseFor } from '../services/today.service';
import type { AppDeps } from './deps';

/** The musician's programme for today, from the engine and the plan's current state. */
export function todayRoutes({ auth, db, now }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('musician'));
  router.get('/', (_req, res) => {
    const { body, etag } = todayResponseFor(db, currentUser(res.locals).id, now());
    res.set({ ETag: etag, 'Content-Type': 'application/json; charset=utf-8' }).send(body);
  });
  return router;
}
