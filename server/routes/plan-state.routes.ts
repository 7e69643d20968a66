import { Router } from 'express';
import { OverrideRequestSchema, type OverrideRequest } from '../../shared/schemas/plan';
import { currentUser } from '../middleware/auth';
import { validateBody } from '../middleware/validate';
import { listOverrides, planState, recordOverride } from '../services/override.service';
import { printablePlan } from '../services/print.service';
import type { AppDeps } from './deps';
import { paramsOf } from './params';

/** The active plan of one musician (/api/musicians/:id/plan): state, overrides, printable page. */
export function planStateRoutes({ db, now }: AppDeps): Router {
  const router = Router({ mergeParams: true });
  const ids = (req: Parameters<typeof paramsOf>[0], locals: Express.Locals) => ({ clinicianId: currentUser(locals).id, musicianId: paramsOf(req, 'id').id });

  // PlanState (404 no_active_plan without an active plan)
  router.get('/', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(planState(db, clinicianId, musicianId, now()));
  });

  // OverrideRecord[], newest first
  router.get('/overrides', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(listOverrides(db, clinicianId, musicianId));
  });

  // OverrideRequest -> 201 OverrideResult; 409 no_effect when the engine would ignore it.
  router.post('/overrides', validateBody(OverrideRequestSchema), (req, res) => {
    const { musicianId } = ids(req, res.locals);
    res.status(201).json(recordOverride(db, currentUser(res.locals), musicianId, req.body as OverrideRequest, now()));
  });

  // text/html: a self-contained printable page.
  router.get('/print', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    const html = printablePlan(db, clinicianId, musicianId, now());
    res.type('html').set('cache-control', 'no-store').send(html);
  });

  return router;
}
