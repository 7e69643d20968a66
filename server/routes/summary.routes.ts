import { Router } from 'express';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { sendSummary } from '../services/summary.service';
import type { AppDeps } from './deps';

/** The weekly caseload summary, sent on demand (the schedule lives in server/jobs). */
export function summaryRoutes({ auth, db, mailer, env, now }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('clinician'));

  // -> SummarySent; 502 mail_failed when the e-mail could not be handed to SMTP.
  router.post('/send-now', async (_req, res) => {
    try {
      res.json(await sendSummary({ db, mailer, publicUrl: env.PUBLIC_URL }, currentUser(res.locals), now(), true));
    } catch (error) {
      console.error('[mail] summary not sent:', error);
      res.status(502).json({ error: { code: 'mail_failed', message: 'The summary could not be sent just now. Try again in a few minutes.' } });
    }
  });

  return router;
}
