import type { Statement } from 'better-sqlite3';
import { localDateOf } from '../../shared/scheduler';
import type { CaseloadEntry } from '../../shared/schemas/musician';
import type { Db } from '../db/client';

/**
 * Caseload rows replay every musician's check-ins through the engine: about 5 ms each, so 250 ms for a
 * caseload of 50. The result depends only on the musician's active plan, check-ins, overrides, pieces
 * and the plan's local date, so it is kept per musician under a fingerprint of exactly those rows.
 * The fingerprint is read from the database on every request (index-only lookups, no payloads), so a
 * write through any path, present or future, is seen at once without anyone remembering to invalidate.
 * Check-ins and overrides are only ever inserted (or cascade-deleted with the musician): their count,
 * highest rowid and latest date identify them; plans and pieces can change in place and are compared whole.
 * Today's programme (today.service.ts) depends on the same rows, so it is kept the same way in a cache of its own.
 */
export type CachedPart = Pick<CaseloadEntry, 'plan' | 'status' | 'lastCheckInDate' | 'alerts'>;

interface Held<T> {
  fingerprint: string;
  timeZone: string | null;
  date: string | null;
  part: T;
}

export type Compute<T> = () => { part: T; timeZone: string | null };

/**
 * The fingerprint's columns, for a query over `musicians m`. Values that could run into each other
 * (a piece's title and composer) are joined as JSON arrays, so no two different rows read the same.
 */
export const FINGERPRINT_COLUMNS = `m.id as id,
    (select count(*) || '.' || ifnull(max(c.rowid), 0) || '.' || ifnull(max(c.date), '') from check_ins c where c.musician_id = m.id) as checkIns,
    (select count(*) || '.' || ifnull(max(o.rowid), 0) || '.' || ifnull(json_group_array(u.name), '')
       from plan_overrides o join user u on u.id = o.by_user_id where o.musician_id = m.id) as overrides,
    (select json_array(p.id, p.version, p.settings) from plans p where p.musician_id = m.id and p.status = 'active') as plan,
    (select json_group_array(json_array(x.id, x.title, x.composer, x.tier, x.passages, x.on_programme))
       from pieces x where x.musician_id = m.id) as pieces`;

const FINGERPRINT = `select ${FINGERPRINT_COLUMNS} from musicians m`;

export type FingerprintRow = { id: string; checkIns: string; overrides: string; plan: string | null; pieces: string | null };
type Row = FingerprintRow;

/** One musician's fingerprint from a row of FINGERPRINT_COLUMNS. */
export const fingerprintOf = (row: FingerprintRow): string => JSON.stringify([row.checkIns, row.overrides, row.plan, row.pieces]);

// A clinic of 10,000 musicians fits; beyond that the oldest entries go first (Map keeps insertion order).
const MAX_ENTRIES = 20_000;

const statements = new WeakMap<Db, { byClinician: Statement<[string], Row>; byMusician: Statement<[string], Row> }>();

function statementsFor(db: Db) {
  let found = statements.get(db);
  if (!found) {
    found = {
      byClinician: db.$client.prepare<[string], Row>(`${FINGERPRINT} where m.clinician_id = ?`),
      byMusician: db.$client.prepare<[string], Row>(`${FINGERPRINT} where m.id = ?`),
    };
    statements.set(db, found);
  }
  return found;
}

/** Fingerprints of one clinician's musicians (or of one musician), keyed by musician id. */
export function fingerprints(db: Db, scope: { clinicianId: string } | { musicianId: string }): Map<string, string> {
  const { byClinician, byMusician } = statementsFor(db);
  const rows = 'clinicianId' in scope ? byClinician.all(scope.clinicianId) : byMusician.all(scope.musicianId);
  return new Map(rows.map((row) => [row.id, fingerprintOf(row)]));
}

/**
 * A per-musician cache of one engine result: `compute` runs only when the fingerprint or the plan's local
 * date has changed. Without a fingerprint (the musician has no row) nothing is kept.
 */
export function musicianCache<T>() {
  const held = new WeakMap<Db, Map<string, Held<T>>>();
  return (db: Db, musicianId: string, fingerprint: string | undefined, now: Date, compute: Compute<T>): T => {
    let entries = held.get(db);
    if (!entries) {
      entries = new Map();
      held.set(db, entries);
    }
    const hit = entries.get(musicianId);
    if (fingerprint !== undefined && hit && hit.fingerprint === fingerprint && hit.date === (hit.timeZone ? localDateOf(now, hit.timeZone) : null)) {
      return hit.part;
    }
    const { part, timeZone } = compute();
    if (fingerprint === undefined) return part;
    entries.delete(musicianId);
    entries.set(musicianId, { fingerprint, timeZone, date: timeZone ? localDateOf(now, timeZone) : null, part });
    if (entries.size > MAX_ENTRIES) {
      const oldest = entries.keys().next().value;
      if (oldest !== undefined) entries.delete(oldest);
    }
    return part;
  };
}

/** The engine's part of a caseload row, from the cache when nothing it depends on has changed. */
export const cachedPart = musicianCache<CachedPart>();
