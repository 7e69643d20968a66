import { Router } from 'express';
import { CreateSetupItemSchema, UpdateSetupItemSchema, type CreateSetupItem, type UpdateSetupItem } from '../../shared/schemas/setup';
import { currentUser } from '../middleware/auth';
import { validateBody } from '../middleware/validate';
import { addSetupItem, deleteSetupItem, listSetup, updateSetupItem } from '../services/setup.service';
import type { AppDeps } from './deps';
import { paramsOf } from './params';

/** The setup and ergonomics checklist of one musician (/api/musicians/:id/setup). */
export function setupRoutes({ db, now }: AppDeps): Router {
  const router = Router({ mergeParams: true });
  const ids = (req: Parameters<typeof paramsOf>[0], locals: Express.Locals) => ({ clinicianId: currentUser(locals).id, musicianId: paramsOf(req, 'id').id });

  // SetupItem[]
  router.get('/', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(listSetup(db, clinicianId, musicianId));
  });

  // CreateSetupItem -> 201 SetupItem
  router.post('/', validateBody(CreateSetupItemSchema), (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.status(201).json(addSetupItem(db, clinicianId, musicianId, req.body as CreateSetupItem, now()));
  });

  // UpdateSetupItem -> SetupItem (set active: false to stop reminding the musician)
  router.patch('/:itemId', validateBody(UpdateSetupItemSchema), (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(updateSetupItem(db, clinicianId, musicianId, paramsOf(req, 'itemId').itemId, req.body as UpdateSetupItem));
  });

  router.delete('/:itemId', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    deleteSetupItem(db, clinicianId, musicianId, paramsOf(req, 'itemId').itemId);
    res.status(204).end();
  });

  return router;
}
