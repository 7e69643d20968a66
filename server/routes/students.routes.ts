import { Router } from 'express';
import { z } from 'zod';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { clearanceNoteHtml } from '../lib/clearance-note';
import { listStudents, studentClearance } from '../services/student.service';
import type { AppDeps } from './deps';

const IdParams = z.object({ id: z.string().min(1).max(100) });

/** A teacher's students: only those who shared their clearance, and nothing medical. */
export function studentRoutes({ auth, db, now }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('teacher'));

  router.get('/', (_req, res) => {
    res.json(listStudents(db, currentUser(res.locals).id, now()));
  });

  router.get('/:id', (req, res) => {
    const { id } = IdParams.parse(req.params);
    res.json(studentClearance(db, currentUser(res.locals).id, id, now()));
  });

  // A dated note for rehearsals: what is cleared and the limits, printable from the browser.
  router.get('/:id/print', (req, res) => {
    const { id } = IdParams.parse(req.params);
    // Built before the content type is set, so a refusal still answers as JSON.
    const html = clearanceNoteHtml(studentClearance(db, currentUser(res.locals).id, id, now()));
    res.type('html').send(html);
  });

  return router;
}
