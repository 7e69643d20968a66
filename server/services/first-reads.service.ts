import { firstReadsOf, type FirstRead, type FirstReads } from '../../shared/web/first-reads';
import type { Me } from '../../shared/schemas/role';
import type { Db } from '../db/client';
import { HttpError } from '../lib/http-error';
import { musicianHome } from './musician-home.service';
import { todayResponseFor } from './today.service';

/**
 * Each first read answered as its API route answers it (server/routes: me, today), so the page carries
 * exactly what the app would have been sent. The role checks are the routes' own.
 */
const answers: Record<FirstRead, (db: Db, me: Me, now: Date) => unknown> = {
  '/api/me': (_db, me) => me,
  '/api/today': (db, me, now) => (me.role === 'musician' ? JSON.parse(todayResponseFor(db, me.id, now).body.toString('utf8')) : undefined),
  '/api/me/musician': (db, me, now) => (me.role === 'musician' ? musicianHome(db, me.id, now) : undefined),
};

/**
 * The reads the page at `pathname` needs first, answered for `me`. A read that fails (a musician with no
 * active plan has no day) is left out: the app asks for it and shows the API's answer as it always does.
 */
export function answerFirstReads(db: Db, me: Me, pathname: string, now: Date): FirstReads {
  const reads: FirstReads = {};
  for (const read of firstReadsOf(pathname, me.role)) {
    try {
      const answer = answers[read](db, me, now);
      // As JSON carries it: dates as strings, nothing undefined.
      if (answer !== undefined) reads[read] = JSON.parse(JSON.stringify(answer));
    } catch (error) {
      // An answer the API gives as an error (no plan, no musician) is the app's to show; anything else is a fault worth a line in the log.
      if (!(error instanceof HttpError)) console.error(`first read ${read} for ${pathname} failed`, error);
    }
  }
  return reads;
}
