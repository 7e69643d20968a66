import { createHash } from 'node:crypto';
import type { Db } from '@/server/db/client';

/** A digest of every row of every table: equal before and after means nothing was written. */
export function databaseChecksum(db: Db): string {
  const sqlite = db.$client;
  const tables = sqlite
    .prepare("select name from sqlite_master where type = 'table' and name not like 'sqlite_%' and name not like '__drizzle%' order by name")
    .all() as { name: string }[];
  const hash = createHash('sha256');
  for (const { name } of tables) {
    hash.update(name);
    for (const row of sqlite.prepare(`select * from "${name}" order by rowid`).all()) hash.update(JSON.stringify(row));
  }
  return hash.digest('hex');
}
