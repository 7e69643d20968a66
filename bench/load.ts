import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import Database from 'better-sqlite3';
import { localDateOf } from '../shared/scheduler';
import { BENCH_NOW, BENCH_PASSWORD, generateClinic, musicianEmail } from './clinic-db';
import { signIn, startServer } from './server-control';

export interface LoadOptions {
  musicians: number;
  seconds: number;
  port: number;
}

export interface LoadReport {
  requests: number;
  errors: number;
  non2xx: number;
  lockedAnswers: number;
  attemptedWrites: number;
  acknowledgedWrites: number;
  storedWrites: number;
  duplicateWrites: number;
  lostWrites: number;
  requestsPerSecond: number;
  p99Ms: number;
}

/**
 * Many musicians at once, each reading today's session and writing check-ins in turn, against the real
 * app in its own process on loopback, for a fixed time. Afterwards the database is read directly: every
 * acknowledged check-in must be there exactly once.
 */
export async function runLoad(options: LoadOptions): Promise<LoadReport> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ritorno-load-'));
  const dbFile = path.join(dir, 'load.db');
  await generateClinic(dbFile, { clinicians: Math.max(1, Math.ceil(options.musicians / 25)), musicians: options.musicians, checkIns: options.musicians * 20 });
  const server = await startServer({ port: options.port, dbFile });
  const date = localDateOf(BENCH_NOW, 'Europe/London');
  const acknowledged = new Set<string>();
  let lockedAnswers = 0;
  let attempted = 0;
  try {
    const cookies = await Promise.all(Array.from({ length: options.musicians }, (_, i) => signIn(server.url, musicianEmail(i), BENCH_PASSWORD)));
    const runs = cookies.map((cookie, musician) => {
      let sequence = 0;
      return autocannon({
        url: server.url,
        connections: 1,
        duration: options.seconds,
        headers: { cookie, 'content-type': 'application/json' },
        requests: [
          { method: 'GET', path: '/api/today' },
          {
            method: 'POST',
            path: '/api/check-ins',
            setupRequest: (request) => {
              sequence += 1;
              attempted += 1;
              const clientKey = `load-${musician}-${sequence}`;
              return { ...request, body: JSON.stringify({ clientKey, checkIn: { kind: 'pain_report', date, pain: 0 } }) };
            },
            onResponse: (status, body) => {
              if (body.includes('database is locked')) lockedAnswers += 1;
              const key = /"id":"([^"]+)"/.test(body) && status === 201 ? `load-${musician}-${sequence}` : null;
              if (key) acknowledged.add(key);
            },
          },
        ],
      });
    });
    const results = await Promise.all(runs);
    await server.stop();
    const db = new Database(dbFile, { readonly: true });
    const rows = db.prepare("select client_key as key, count(*) as n from check_ins where client_key like 'load-%' group by musician_id, client_key").all() as { key: string; n: number }[];
    db.close();
    const stored = new Set(rows.map((row) => row.key));
    const requests = results.reduce((sum, r) => sum + r.requests.total, 0);
    const seconds = Math.max(...results.map((r) => r.duration));
    return {
      requests,
      errors: results.reduce((sum, r) => sum + r.errors + r.timeouts, 0),
      non2xx: results.reduce((sum, r) => sum + r.non2xx, 0),
      lockedAnswers,
      attemptedWrites: attempted,
      acknowledgedWrites: acknowledged.size,
      storedWrites: stored.size,
      duplicateWrites: rows.filter((row) => row.n > 1).length,
      lostWrites: [...acknowledged].filter((key) => !stored.has(key)).length,
      requestsPerSecond: requests / seconds,
      p99Ms: Math.max(...results.map((r) => r.latency.p99)),
    };
  } finally {
    await server.stop();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
