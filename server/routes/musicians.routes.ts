import { Router } from 'express';
import { CaseloadQuerySchema } from '../../shared/schemas/musician';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { auditRecordReads } from '../middleware/audit-reads';
import { musicianTrail } from '../services/audit-trail.service';
import { ownMusician } from '../services/own-musician';
import { getCaseloadEntry, listCaseload } from '../services/caseload.service';
import type { AppDeps } from './deps';
import { documentRoutes } from './documents.routes';
import { paramsOf } from './params';
import { pieceRoutes } from './pieces.routes';
import { planStateRoutes } from './plan-state.routes';
import { planVersionRoutes } from './plan-versions.routes';
import { recordRoutes } from './record.routes';
import { setupRoutes } from './setup.routes';

/**
 * The clinician's caseload and everything under one musician (/api/musicians/:id/...). The session and
 * the role are checked here once for every sub-router; each service then checks ownership (404).
 */
export function musicianRoutes(deps: AppDeps): Router {
  const { auth, db, now } = deps;
  const router = Router();
  router.use(requireSession(auth), requireRole('clinician'));

  // ?sort=name|alerts|event|last_check_in, ?status=<status>|no_plan, ?alerts=only
  router.get('/', (req, res) => {
    const query = CaseloadQuerySchema.parse(req.query);
    res.json(listCaseload(db, currentUser(res.locals).id, now(), query));
  });

  router.use('/:id', auditRecordReads(db, now));

  router.get('/:id/audit', (req, res) => {
    const { id } = paramsOf(req, 'id');
    ownMusician(db, currentUser(res.locals).id, id);
    res.json(musicianTrail(db, id));
  });

  router.get('/:id', (req, res) => {
    const { id } = paramsOf(req, 'id');
    res.json(getCaseloadEntry(db, currentUser(res.locals).id, id, now()));
  });

  router.use('/:id/plans', planVersionRoutes(deps));
  router.use('/:id/plan', planStateRoutes(deps));
  router.use('/:id/pieces', pieceRoutes(deps));
  router.use('/:id/setup', setupRoutes(deps));
  router.use('/:id/documents', documentRoutes(deps));
  router.use('/:id', recordRoutes(deps));
  return router;
}
