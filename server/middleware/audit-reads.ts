import type { RequestHandler } from 'express';
import type { Db } from '../db/client';
import { audit } from '../services/audit';
import { currentUser } from './auth';

/**
 * Records every successful read of a clinical record under /api/musicians/:id (who, what, when).
 * Written after the answer, once ownership has been proven by the 200.
 */
export function auditRecordReads(db: Db, now: () => Date): RequestHandler {
  return (req, res, next) => {
    if (req.method !== 'GET') return next();
    const musicianId = String(req.params.id ?? '');
    const what = req.originalUrl.split('?')[0] ?? '';
    res.on('finish', () => {
      if (res.statusCode !== 200 || !res.locals.me) return;
      try {
        audit(db, { actorId: currentUser(res.locals).id, action: 'record.read', musicianId, detail: { path: what }, at: now() });
      } catch (error) {
        console.error('[audit] read not recorded:', error);
      }
    });
    next();
  };
}
