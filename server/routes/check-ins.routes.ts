import { Router } from 'express';
import { CheckInUploadSchema, type CheckInUpload } from '../../shared/schemas/today';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { validateBody } from '../middleware/validate';
import { listCheckIns, submitCheckIn } from '../services/check-in.service';
import { getMusicianByUser } from '../services/musician.service';
import type { AppDeps } from './deps';

/** A musician's own check-ins: gates, effort, minutes played, next-morning checks. */
export function checkInRoutes({ auth, db, mailer, env, now }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('musician'));
  const musicianIdOf = (locals: Express.Locals) => getMusicianByUser(db, currentUser(locals).id).musician.id;

  router.get('/', (_req, res) => {
    res.json(listCheckIns(db, musicianIdOf(res.locals)));
  });

  // A retry with the same clientKey answers 200 with the first result instead of saving twice.
  router.post('/', validateBody(CheckInUploadSchema), async (req, res) => {
    const deps = { db, mailer, publicUrl: env.PUBLIC_URL };
    const result = await submitCheckIn(deps, musicianIdOf(res.locals), req.body as CheckInUpload, now());
    res.status(result.duplicate ? 200 : 201).json(result);
  });

  return router;
}
