import { Router } from 'express';
import { requireRole, requireSession } from '../middleware/auth';
import { planPresets } from '../services/plan-version.service';
import type { AppDeps } from './deps';

/** Starting points for the plan builder (/api/plan-presets): the engine's defaults and the presets. */
export function planPresetRoutes({ auth }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('clinician'));
  // PlanPresets
  router.get('/', (_req, res) => {
    res.json(planPresets());
  });
  return router;
}
