import { Router } from 'express';
import type { MusicianHome } from '../../shared/schemas/musician';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { getMusicianByUser } from '../services/musician.service';
import { planOverview } from '../services/plan.service';
import type { AppDeps } from './deps';

export function meRoutes({ auth, db, now }: AppDeps): Router {
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
      plan: planOverview(db, musician.id, now()),
    };
    res.json(home);
  });

  return router;
}
