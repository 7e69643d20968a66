import { execFile } from 'node:child_process';
import fs from 'node:fs';
import type { Server } from 'node:http';
import path from 'node:path';
import { promisify } from 'node:util';
import compression from 'compression';
import express from 'express';
import { BENCH_PASSWORD, musicianEmail } from './clinic-db';
import { verdict, type Bench, type Row } from './harness';
import { signIn } from './server-control';
import { MINIMAL_DIST, WORK } from './web.bench';

interface Scores { performance: number; accessibility: number; finalUrl: string; failing: string[]; lcpMs: number; tbtMs: number; runtimeError?: string }
/** The median run's scores, and every run's performance score. */
type Median = Scores & { spread: string };

const MINIMAL_PORT = 8171;
// One Lighthouse run on this machine varies by several points (its own blocking-time figure moves by
// hundreds of milliseconds from run to run): each page is run this many times and the median reported,
// as Lighthouse's documentation advises for variability (it suggests five).
const RUNS = 5;
// A run Lighthouse itself reports as failed (a runtime error such as NO_NAVSTART, "run Lighthouse again")
// has no scores: it is run again, up to this many times, rather than counted as zero.
const RETRIES = 2;

// Asynchronous: the minimal app is served from this process while Lighthouse loads it.
const run = promisify(execFile);

async function lighthouseOnce(name: string, url: string, cookie?: string): Promise<Scores> {
  const report = path.join(WORK, `lighthouse-${name}.json`);
  const env = { ...process.env, LIGHTHOUSE_REPORT: report };
  for (let attempt = 0; ; attempt++) {
    const { stdout: out } = await run(process.execPath, [path.join(__dirname, 'lighthouse-run.mjs'), url, ...(cookie ? [cookie] : [])], { encoding: 'utf8', timeout: 180_000, env });
    const scores = JSON.parse(out.trim().split('\n').at(-1) ?? '{}') as Scores;
    if (scores.runtimeError && attempt < RETRIES) {
      console.error(`lighthouse ${name}: run failed (${scores.runtimeError}), running again`);
      continue;
    }
    if (scores.runtimeError) throw new Error(`Lighthouse could not measure ${url}: ${scores.runtimeError}`);
    console.error(`lighthouse ${name}: ${scores.finalUrl}; below 0.9: ${scores.failing.join(', ')}; report in ${report}`);
    return scores;
  }
}

/** The median run by performance score, with its own paint and blocking-time figures. */
async function lighthouse(name: string, url: string, cookie?: string): Promise<Median> {
  const runs: Scores[] = [];
  for (let run = 0; run < RUNS; run++) runs.push(await lighthouseOnce(name, url, cookie));
  runs.sort((a, b) => a.performance - b.performance);
  const median = runs[Math.floor(RUNS / 2)] as Scores;
  return { ...median, spread: runs.map((r) => r.performance).join(', ') };
}

const line = (s: Median) =>
  `${s.performance} / ${s.accessibility} (median of ${s.spread}; largest paint ${(s.lcpMs / 1000).toFixed(1)} s, blocking ${s.tbtMs} ms)`;

/** The minimal Expo Router app the bundle bench built, served the way ours is (static files, gzip). */
async function minimalBaseline(): Promise<(Median) | null> {
  if (!fs.existsSync(path.join(MINIMAL_DIST, 'index.html'))) return null;
  const app = express();
  app.use(compression());
  app.use(express.static(MINIMAL_DIST));
  const server = await new Promise<Server>((resolve) => {
    const listening = app.listen(MINIMAL_PORT, '127.0.0.1', () => resolve(listening));
  });
  try {
    return await lighthouse('minimal', `http://127.0.0.1:${MINIMAL_PORT}/`);
  } finally {
    await new Promise((resolve) => server.close(resolve));
  }
}

/**
 * Lighthouse's default (mobile, simulated slow 4G, 4x CPU slowdown) on the sign-in screen and, signed in,
 * the musician's today; the baseline is the minimal Expo Router app of the same SDK on the same machine.
 */
export const lighthouseBench: Bench = {
  name: 'Lighthouse',
  run: async ({ server }) => {
    if (!server) throw new Error('Lighthouse needs the server');
    const cookie = await signIn(server.url, musicianEmail(2), BENCH_PASSWORD);
    const minimal = await minimalBaseline();
    const rows: Row[] = [];
    for (const [screen, url, withCookie] of [
      ['sign-in', `${server.url}/sign-in`, undefined],
      ['today (signed in)', `${server.url}/home`, cookie],
    ] as const) {
      const scores = await lighthouse(screen.split(' ')[0] ?? screen, url, withCookie);
      rows.push({
        area: 'web',
        measure: `Lighthouse mobile, ${screen}: performance / accessibility`,
        ours: line(scores),
        baseline: minimal ? `minimal Expo Router app ${line(minimal)}` : 'minimal app not built',
        ratio: '',
        budget: '>= 90 each',
        verdict: verdict(scores.performance >= 90 && scores.accessibility >= 90),
      });
    }
    return rows;
  },
};
