import type { IncomingHttpHeaders } from 'node:http';
import type { Statement } from 'better-sqlite3';
import { fromNodeHeaders } from 'better-auth/node';
import type { Auth } from '../auth';
import type { Db } from '../db/client';
import { dataGeneration } from '../db/data-generation';

/**
 * better-auth checks the cookie's signature and reads the session and its user through its adapter on
 * every call: most of the cost of a small API request. Its own cookie cache would skip the database, but
 * then a sign-out everywhere, a password reset (which revokes sessions), an expiry or a role change would
 * go unseen on other devices until the cached cookie ran out. Instead the answer is kept here per exact
 * credential as sent (cookie and Authorization headers) and re-checked on every request: while the
 * database's generation (db/data-generation.ts) stands still nothing can have changed; once it moves, one
 * indexed, prepared lookup of the session row and its user decides, and any change to them, or the row's
 * removal, sends the request back through better-auth. Only better-auth creates entries, so a forged credential never hits.
 */
type Session = NonNullable<Awaited<ReturnType<Auth['api']['getSession']>>>;

interface Held {
  session: Session;
  stamp: string;
  expiresAt: number;
  heldSince: number;
  /** The database's generation when the stamp was last confirmed: unchanged, so is the row. */
  confirmedAt: string;
}

type StampRow = { expiresAt: number; updatedAt: number; userUpdatedAt: number; role: string | null; banned: number | null; name: string; email: string };

const STAMP = `select s.expires_at as expiresAt, s.updated_at as updatedAt, u.updated_at as userUpdatedAt,
  u.role as role, u.banned as banned, u.name as name, u.email as email
  from session s join user u on u.id = s.user_id where s.token = ?`;

// After this long an entry goes back through better-auth anyway, so its sliding refresh of the session's
// expiry (at most once a day) still happens on schedule.
const HOLD_MS = 5 * 60 * 1000;
const MAX_ENTRIES = 10_000;

const databases = new WeakMap<Auth, { db: Db; statement: Statement<[string], StampRow>; held: Map<string, Held> }>();

/** Lets requireSession re-check cached sessions in the database better-auth writes to. */
export function rememberSessionDatabase(auth: Auth, db: Db): void {
  databases.set(auth, { db, statement: db.$client.prepare<[string], StampRow>(STAMP), held: new Map() });
}

const stampOf = (row: StampRow | undefined) => (row ? JSON.stringify(row) : null);

/** The session for these headers (null when signed out), as better-auth would answer it now. */
export async function readSession(auth: Auth, headers: IncomingHttpHeaders): Promise<Session | null> {
  const cache = databases.get(auth);
  if (!cache) return auth.api.getSession({ headers: fromNodeHeaders(headers) });
  const key = `${headers.authorization ?? ''}\n${headers.cookie ?? ''}`;
  const now = Date.now();
  const hit = cache.held.get(key);
  const generation = dataGeneration(cache.db);
  if (hit && now - hit.heldSince < HOLD_MS && hit.expiresAt > now) {
    if (hit.confirmedAt === generation) return hit.session;
    if (stampOf(cache.statement.get(hit.session.session.token)) === hit.stamp) {
      hit.confirmedAt = generation;
      return hit.session;
    }
  }
  cache.held.delete(key);
  const session = await auth.api.getSession({ headers: fromNodeHeaders(headers) });
  if (!session) return null;
  // Read after better-auth's own writes (a sliding refresh), so the generation covers them.
  const confirmedAt = dataGeneration(cache.db);
  const row = cache.statement.get(session.session.token);
  const stamp = stampOf(row);
  if (row && stamp) {
    cache.held.set(key, { session, stamp, expiresAt: row.expiresAt, heldSince: now, confirmedAt });
    if (cache.held.size > MAX_ENTRIES) {
      const oldest = cache.held.keys().next().value;
      if (oldest !== undefined) cache.held.delete(oldest);
    }
  }
  return session;
}
