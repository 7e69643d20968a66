import type { Statement } from 'better-sqlite3';
import type { Db } from './client';

/**
 * A value that moves whenever anything in the database may have changed: SQLite's count of rows this
 * connection has inserted, updated or deleted (every write of this server, better-auth's included) and
 * its data version, which moves when another connection or process commits. While it stands still,
 * everything read from the database is still true, so the hot paths (session check, today's programme)
 * can skip their re-checks. A rolled-back write moves it too: that only costs one re-check.
 *
 * The count is read on every call (a counter in memory). The data version costs a few microseconds, so it
 * is read once per turn of the event loop: a commit from outside lands between two requests of the same
 * turn at worst, as if it had come a moment later.
 */
interface Readers {
  changes: Statement<[], number>;
  version: Statement<[], number>;
  versionThisTurn: number | undefined;
}
const readers = new WeakMap<Db, Readers>();

function readersFor(db: Db): Readers {
  let found = readers.get(db);
  if (!found) {
    found = {
      changes: db.$client.prepare<[], number>('select total_changes()').pluck(),
      version: db.$client.prepare<[], number>('pragma data_version').pluck(),
      versionThisTurn: undefined,
    };
    readers.set(db, found);
  }
  return found;
}

export function dataGeneration(db: Db): string {
  const found = readersFor(db);
  if (found.versionThisTurn === undefined) {
    found.versionThisTurn = found.version.get() as number;
    setImmediate(() => {
      found.versionThisTurn = undefined;
    });
  }
  return `${found.changes.get() as number}.${found.versionThisTurn}`;
}

/**
 * A per-database memo of `read(key)` that holds while the generation stands still: anything read from the
 * database alone (no clock, no outside input) can be kept this way. At most `max` keys per database.
 */
export function keptWhileUnchanged<T>(max: number): (db: Db, key: string, read: () => T) => T {
  const held = new WeakMap<Db, Map<string, { generation: string; value: T }>>();
  return (db, key, read) => {
    let entries = held.get(db);
    if (!entries) {
      entries = new Map();
      held.set(db, entries);
    }
    const generation = dataGeneration(db);
    const found = entries.get(key);
    if (found?.generation === generation) return found.value;
    const value = read();
    if (entries.size >= max) entries.clear();
    entries.set(key, { generation, value });
    return value;
  };
}
