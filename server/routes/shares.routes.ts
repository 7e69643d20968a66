import { Router } from 'express';
import { z } from 'zod';
import { CreateShareSchema, type CreateShare } from '../../shared/schemas/share';
import { invitationMail, sharedWithYouMail } from '../lib/mail-templates';
import { sendInBackground } from '../lib/mailer';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { validateBody } from '../middleware/validate';
import { audit } from '../services/audit';
import { syncClearanceNotices } from '../services/clearance-notice.service';
import { getMusicianByUser } from '../services/musician.service';
import { ownMusician } from '../services/own-musician';
import { listShares, shareWithTeacher, stopSharing, withdrawInvitation } from '../services/share.service';
import type { AppDeps } from './deps';

const TeacherParams = z.object({ teacherId: z.string().min(1).max(100) });
const EmailParams = z.object({ email: z.email() });

/** A musician decides who sees their clearance, and can stop at any time. Mounted at /api/shares. */
export function shareRoutes({ auth, db, mailer, env, now }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('musician'));
  const self = (locals: Express.Locals) => {
    const me = currentUser(locals);
    return { me, musician: getMusicianByUser(db, me.id).musician };
  };

  router.get('/', (_req, res) => {
    res.json(listShares(db, self(res.locals).musician.id, now()));
  });

  router.post('/', validateBody(CreateShareSchema), async (req, res) => {
    const { me, musician } = self(res.locals);
    const input = req.body as CreateShare;
    const at = now();
    const outcome = shareWithTeacher(db, { id: musician.id, userId: me.id }, input, at);
    audit(db, { actorId: me.id, action: outcome.kind === 'shared' ? 'share.created' : 'share.invited', musicianId: musician.id, detail: { email: input.email }, at });
    if (outcome.kind === 'invited') {
      const link = `${env.PUBLIC_URL}/invitation/${outcome.token}`;
      const expiresAt = new Date(at.getTime() + 7 * 24 * 3600 * 1000);
      sendInBackground(mailer, invitationMail({ to: input.email, name: input.name, role: 'teacher', invitedBy: musician.name, link, expiresAt }));
    } else {
      sendInBackground(mailer, sharedWithYouMail({ to: input.email, musicianName: musician.name, link: `${env.PUBLIC_URL}/students/${musician.id}` }));
      // The teacher's first view is the baseline for later change e-mails.
      await syncClearanceNotices({ db, mailer, publicUrl: env.PUBLIC_URL }, musician.id, at);
    }
    res.status(201).json(listShares(db, musician.id, at));
  });

  router.delete('/teachers/:teacherId', (req, res) => {
    const { teacherId } = TeacherParams.parse(req.params);
    const { me, musician } = self(res.locals);
    stopSharing(db, musician.id, teacherId);
    audit(db, { actorId: me.id, action: 'share.stopped', musicianId: musician.id, detail: { teacherId }, at: now() });
    res.status(204).end();
  });

  router.delete('/invitations/:email', (req, res) => {
    const { email } = EmailParams.parse(req.params);
    const { me, musician } = self(res.locals);
    withdrawInvitation(db, musician.id, email.toLowerCase());
    audit(db, { actorId: me.id, action: 'share.invitation_withdrawn', musicianId: musician.id, detail: { email }, at: now() });
    res.status(204).end();
  });

  return router;
}

/** The clinician sees who a musician of theirs shares with. Mounted at /api/musicians/:musicianId/shares. */
export function musicianShareRoutes({ auth, db, now }: AppDeps): Router {
  const router = Router({ mergeParams: true });
  router.use(requireSession(auth), requireRole('clinician'));
  router.get('/', (req, res) => {
    const { musicianId } = z.object({ musicianId: z.string().min(1).max(100) }).parse(req.params);
    const musician = ownMusician(db, currentUser(res.locals).id, musicianId);
    res.json(listShares(db, musician.id, now()));
  });
  return router;
}
