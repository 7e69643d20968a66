import { Router } from 'express';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { DEFAULT_SUMMARY_TIME_ZONE } from '../env';
import { perAccountLimit } from '../middleware/user-limit';
import { sendSummary } from '../services/summary.service';
import type { AppDeps } from './deps';

// Sending now is for the odd extra copy; the weekly run needs no button.
export const SEND_NOW_PER_HOUR = 5;

/** The weekly caseload summary, sent on demand (the schedule lives in server/jobs). */
export function summaryRoutes({ auth, db, mailer, env, now }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('clinician'));
  const summaryDeps = { db, mailer, publicUrl: env.PUBLIC_URL, timeZone: env.SUMMARY_TIME_ZONE ?? DEFAULT_SUMMARY_TIME_ZONE };

  // -> SummarySent; 502 mail_failed when the e-mail could not be handed to SMTP; 429 after five in an hour.
  const sendNowLimit = perAccountLimit({ limit: SEND_NOW_PER_HOUR, windowMs: 60 * 60_000, message: 'You have sent five summaries in the last hour. The next one can go out later.' });
  router.post('/send-now', sendNowLimit, async (_req, res) => {
    try {
      res.json(await sendSummary(summaryDeps, currentUser(res.locals), now(), true));
    } catch (error) {
      console.error('[mail] summary not sent:', error);
      res.status(502).json({ error: { code: 'mail_failed', message: 'The summary could not be sent just now. Try again in a few minutes.' } });
    }
  });

  return router;
}
