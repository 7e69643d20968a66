import { Router } from 'express';
import { PlanSettingsBodySchema, type PlanSettingsBody } from '../../shared/schemas/plan';
import { currentUser } from '../middleware/auth';
import { validateBody } from '../middleware/validate';
import { activateAndNotify } from '../services/plan-activation.service';
import { createDraft, deleteDraft, editVersion, getVersion, listVersions, previewPlan } from '../services/plan-version.service';
import type { AppDeps } from './deps';
import { paramsOf } from './params';

/** Plan versions of one musician (/api/musicians/:id/plans), mounted after the clinician check. */
export function planVersionRoutes({ db, mailer, env, now }: AppDeps): Router {
  const router = Router({ mergeParams: true });
  const ids = (req: Parameters<typeof paramsOf>[0], locals: Express.Locals) => ({ clinicianId: currentUser(locals).id, musicianId: paramsOf(req, 'id').id });

  // PlanVersion[], newest first
  router.get('/', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(listVersions(db, clinicianId, musicianId));
  });

  // PlanSettingsBody -> 201 PlanVersion (status draft)
  router.post('/', validateBody(PlanSettingsBodySchema), (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.status(201).json(createDraft(db, clinicianId, musicianId, (req.body as PlanSettingsBody).settings, now()));
  });

  // PlanSettingsBody -> PlanPreview: stages and feasibility with the musician's repertoire; saves nothing.
  router.post('/preview', validateBody(PlanSettingsBodySchema), (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(previewPlan(db, clinicianId, musicianId, (req.body as PlanSettingsBody).settings));
  });

  // PlanVersionDetail (the version with its preview)
  router.get('/:planId', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(getVersion(db, clinicianId, musicianId, paramsOf(req, 'planId').planId));
  });

  // PlanSettingsBody -> PlanVersion: a draft changes in place (200); the active version gets a new draft version (201).
  router.patch('/:planId', validateBody(PlanSettingsBodySchema), (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    const { version, created } = editVersion(db, clinicianId, musicianId, paramsOf(req, 'planId').planId, (req.body as PlanSettingsBody).settings, now());
    res.status(created ? 201 : 200).json(version);
  });

  // Drafts only -> 204
  router.delete('/:planId', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    deleteDraft(db, clinicianId, musicianId, paramsOf(req, 'planId').planId, now());
    res.status(204).end();
  });

  // -> ActivatedPlan; supersedes the active version and e-mails the musician.
  router.post('/:planId/activate', async (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    const deps = { db, mailer, publicUrl: env.PUBLIC_URL };
    res.json(await activateAndNotify(deps, clinicianId, musicianId, paramsOf(req, 'planId').planId, now()));
  });

  return router;
}
