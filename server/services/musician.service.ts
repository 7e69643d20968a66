import { eq, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import { musicians, user } from '../db/schema';
import { notFound } from '../lib/http-error';

// Every musician's request starts here: prepared once per database rather than built per request.
const prepareByUser = (db: Db) =>
  db
    .select({ musician: musicians, clinicianName: user.name })
    .from(musicians)
    .innerJoin(user, eq(user.id, musicians.clinicianId))
    .where(eq(musicians.userId, sql.placeholder('userId')))
    .prepare();
const byUser = new WeakMap<Db, ReturnType<typeof prepareByUser>>();

export function getMusicianByUser(db: Db, userId: string) {
  let statement = byUser.get(db);
  if (!statement) {
    statement = prepareByUser(db);
    byUser.set(db, statement);
  }
  const found = statement.get({ userId });
  if (!found) throw notFound('Musician record');
  return found;
}
