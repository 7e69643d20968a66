import { Router } from 'express';
import { z } from 'zod';
import { currentUser, requireRole, requireSession } from '../middleware/auth';
import { calendarFor, feedStatus, musicianOfFeed, regenerateFeed } from '../services/calendar.service';
import { getMusicianByUser } from '../services/musician.service';
import type { AppDeps } from './deps';

const FeedParams = z.object({ file: z.string().regex(/^[A-Za-z0-9_-]{20,64}\.ics$/, 'Not a feed link') });

const ICS = 'text/calendar; charset=utf-8';

/** The plan's sessions as iCalendar: a download, and a private subscription feed behind a secret link. */
export function calendarRoutes({ auth, db, env, now }: AppDeps): Router {
  const router = Router();

  // Public: the secret in the link is the credential. Unknown or replaced links answer 404.
  router.get('/feeds/:file', (req, res) => {
    const parsed = FeedParams.safeParse(req.params);
    if (!parsed.success) {
      res.status(404).json({ error: { code: 'not_found', message: 'Calendar feed not found.' } });
      return;
    }
    const musicianId = musicianOfFeed(db, parsed.data.file.replace(/\.ics$/, ''));
    const ics = calendarFor(db, musicianId, now());
    res.set('cache-control', 'private, max-age=300').type(ICS).send(ics);
  });

  router.use(requireSession(auth), requireRole('musician'));
  const musicianIdOf = (locals: Express.Locals) => getMusicianByUser(db, currentUser(locals).id).musician.id;

  router.get('/download.ics', (_req, res) => {
    // Built before any header is set, so an error still answers as JSON.
    const ics = calendarFor(db, musicianIdOf(res.locals), now());
    res.type(ICS).attachment('ritorno-sessions.ics').send(ics);
  });

  router.get('/feed', (_req, res) => {
    res.json({ feed: feedStatus(db, musicianIdOf(res.locals)) });
  });

  // The link is shown once; regenerating replaces it and the old one answers 404 from then on.
  router.post('/feed', (_req, res) => {
    const token = regenerateFeed(db, musicianIdOf(res.locals), now());
    res.status(201).json({ url: `${env.PUBLIC_URL}/api/calendar/feeds/${token}.ics` });
  });

  return router;
}
