import { Router } from 'express';
import { z } from 'zod';
import { AcceptInvitationSchema, CreateInvitationSchema, type CreateInvitation } from '../../shared/schemas/invitation';
import { invitationMail } from '../lib/mail-templates';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { validateBody } from '../middleware/validate';
import { acceptInvitation, createInvitation, listInvitations, previewInvitation } from '../services/invitation.service';
import type { AppDeps } from './deps';

const TokenParams = z.object({ token: z.string().min(16).max(200) });

export function invitationRoutes({ auth, db, mailer, env, now }: AppDeps): Router {
  const router = Router();

  // Public: the link in the e-mail is the credential.
  router.get('/by-token/:token', (req, res) => {
    const { token } = TokenParams.parse(req.params);
    res.json(previewInvitation(db, token, now()));
  });

  router.post('/by-token/:token/accept', validateBody(AcceptInvitationSchema), async (req, res) => {
    const { token } = TokenParams.parse(req.params);
    res.status(201).json(await acceptInvitation(db, auth, token, req.body.password, now()));
  });

  router.use(requireSession(auth), requireRole('clinician'));

  router.get('/', (_req, res) => {
    res.json(listInvitations(db, currentUser(res.locals).id, now()));
  });

  router.post('/', validateBody(CreateInvitationSchema), async (req, res) => {
    const clinician = currentUser(res.locals);
    const input = req.body as CreateInvitation;
    const created = createInvitation(db, clinician.id, input, now());
    const link = `${env.PUBLIC_URL}/invitation/${created.token}`;
    let emailSent = true;
    try {
      await mailer.send(
        invitationMail({
          to: input.email,
          name: input.name,
          role: input.role,
          invitedBy: clinician.name,
          link,
          expiresAt: new Date(created.invitation.expiresAt),
        }),
      );
    } catch (error) {
      console.error('[mail] invitation not sent:', error);
      emailSent = false;
    }
    res.status(201).json({ ...created.invitation, musicianId: created.musicianId, emailSent });
  });

  return router;
}
