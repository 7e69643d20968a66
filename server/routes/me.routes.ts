import { Router } from 'express';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { musicianHome } from '../services/musician-home.service';
import type { AppDeps } from './deps';

export function meRoutes({ auth, db, now }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth));

  router.get('/', (_req, res) => {
    res.json(currentUser(res.locals));
  });

  router.get('/musician', requireRole('musician'), (_req, res) => {
    res.json(musicianHome(db, currentUser(res.locals).id, now()));
  });

  return router;
}
