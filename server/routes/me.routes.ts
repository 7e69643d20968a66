import { Router } from 'express';
import type { MusicianHome } from '../../shared/schemas/musician';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { getMusicianByUser } from '../services/musician.service';
import type { AppDeps } from './deps';

export function meRoutes({ auth, db }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth));

  router.get('/', (_req, res) => {
    res.json(currentUser(res.locals));
  });

  router.get('/musician', requireRole('musician'), (_req, res) => {
    const { musician, clinicianName } = getMusicianByUser(db, currentUser(res.locals).id);
    const home: MusicianHome = {
      id: musician.id,
      name: musician.name,
      instrument: musician.instrument,
      clinicianName,
      plan: null,
    };
    res.json(home);
  });

  return router;
}
