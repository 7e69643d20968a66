import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';

/**
 * Copies a live SQLite database with SQLite's online backup API: consistent even while the server
 * writes, without stopping it. Checks the copy's integrity before returning.
 */
export async function backupDatabase(source: string, destination: string): Promise<{ pages: number }> {
  fs.mkdirSync(path.dirname(path.resolve(destination)), { recursive: true });
  const db = new Database(source, { fileMustExist: true });
  try {
    db.pragma('busy_timeout = 5000');
    const result = await db.backup(destination);
    assertIntact(destination);
    return { pages: result.totalPages };
  } finally {
    db.close();
  }
}

/** Replaces the database with a backup. Run it with the server stopped; the old file is kept aside. */
export function restoreDatabase(backup: string, target: string): { keptAs: string | null } {
  assertIntact(backup);
  let keptAs: string | null = null;
  if (fs.existsSync(target)) {
    keptAs = `${target}.before-restore-${Date.now()}`;
    fs.renameSync(target, keptAs);
  }
  for (const suffix of ['-wal', '-shm']) fs.rmSync(`${target}${suffix}`, { force: true });
  fs.copyFileSync(backup, target);
  return { keptAs };
}

function assertIntact(file: string): void {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const result = db.pragma('integrity_check', { simple: true });
    if (result !== 'ok') throw new Error(`${file} failed SQLite's integrity check: ${String(result)}`);
  } finally {
    db.close();
  }
}
