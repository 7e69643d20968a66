import { Router } from 'express';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { getMusicianByUser } from '../services/musician.service';
import { myPlanFor } from '../services/my-plan.service';
import type { AppDeps } from './deps';

/** The signed-in musician's own plan: stages to the event, where they stand, what unlocks next. */
export function myPlanRoutes({ auth, db, now }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('musician'));
  // MyPlan; 404 until a plan is active.
  router.get('/', (_req, res) => {
    const { musician } = getMusicianByUser(db, currentUser(res.locals).id);
    res.json(myPlanFor(db, musician.id, now()));
  });
  return router;
}
