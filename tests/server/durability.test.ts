import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { backupDatabase, restoreDatabase } from '@/server/lib/backup';
import { DEMO_PASSWORD } from '@/server/db/demo-scenario';
import { localDateOf } from '@/shared/scheduler';
import { signInCookie, startRealServer, type RealServer } from './support/real-server';

jest.setTimeout(90_000);

const MUSICIANS = ['ilse.varga', 'caio.brandt', 'noor.haddad', 'felix.amsel'].map((name) => `${name}@harbourside.example`);

async function postCheckIn(server: RealServer, cookie: string, clientKey: string): Promise<number> {
  const response = await fetch(`${server.baseUrl}/api/check-ins`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie, origin: server.baseUrl },
    // A pain-free report changes nothing in the plan and sends no e-mail: pure write load.
    body: JSON.stringify({ clientKey, checkIn: { kind: 'pain_report', date: localDateOf(new Date(), 'Europe/London'), pain: 0 } }),
  });
  return response.status;
}

describe('durability', () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ritorno-crash-'));
  const databasePath = path.join(dir, 'ritorno.db');
  let server: RealServer | null = null;
  afterAll(() => {
    server?.child.kill('SIGKILL');
  });

  it('keeps every acknowledged check-in, once, after the server is killed mid-stream', async () => {
    server = await startRealServer(databasePath);
    const live = server;
    const cookies = await Promise.all(MUSICIANS.map((email) => signInCookie(live.baseUrl, email, DEMO_PASSWORD)));
    const acknowledged = new Set<string>();
    const attempted = new Set<string>();
    let stop = false;
    const client = async (index: number) => {
      for (let n = 0; !stop; n += 1) {
        const key = `crash-${index}-${n}`;
        attempted.add(key);
        try {
          const status = await postCheckIn(live, cookies[index] ?? '', key);
          if (status === 201) acknowledged.add(key);
        } catch {
          return; // the connection died with the server
        }
      }
    };
    const clients = MUSICIANS.map((_, index) => client(index));
    await new Promise((resolve) => setTimeout(resolve, 1500));
    live.child.kill('SIGKILL');
    stop = true;
    await Promise.all(clients);
    expect(acknowledged.size).toBeGreaterThan(20);

    // Restart on the same file, then retry everything that was attempted: acknowledged ones must be
    // found (200, duplicate) and the rest saved once.
    server = await startRealServer(databasePath);
    const again = server;
    const fresh = await Promise.all(MUSICIANS.map((email) => signInCookie(again.baseUrl, email, DEMO_PASSWORD)));
    for (const key of acknowledged) {
      const index = Number(key.split('-')[1]);
      expect(await postCheckIn(again, fresh[index] ?? '', key)).toBe(200);
    }
    again.child.kill('SIGTERM');
    await new Promise((resolve) => again.child.once('exit', resolve));
    server = null;

    const db = new Database(databasePath, { readonly: true });
    const rows = db.prepare("select client_key as key, count(*) as n from check_ins where client_key like 'crash-%' group by client_key").all() as { key: string; n: number }[];
    db.close();
    const stored = new Map(rows.map((row) => [row.key, row.n]));
    for (const key of acknowledged) expect(stored.get(key)).toBe(1);
    for (const [key] of stored) expect(attempted.has(key)).toBe(true);
  });

  it('backs up a live database and restores it', async () => {
    const source = path.join(dir, 'live.db');
    const db = new Database(source);
    db.pragma('journal_mode = WAL');
    db.exec('create table t (n integer)');
    db.prepare('insert into t values (1), (2), (3)').run();
    await backupDatabase(source, path.join(dir, 'backup.db'));
    db.prepare('insert into t values (4)').run();
    db.close();

    const { keptAs } = restoreDatabase(path.join(dir, 'backup.db'), source);
    expect(keptAs).not.toBeNull();
    const restored = new Database(source, { readonly: true });
    expect(restored.prepare('select count(*) as n from t').get()).toEqual({ n: 3 });
    restored.close();
    fs.writeFileSync(path.join(dir, 'broken.db'), 'not a database');
    expect(() => restoreDatabase(path.join(dir, 'broken.db'), source)).toThrow();
  });
});
