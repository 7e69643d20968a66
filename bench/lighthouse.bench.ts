import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { BENCH_PASSWORD, musicianEmail } from './clinic-db';
import { verdict, type Bench, type Row } from './harness';
import { signIn } from './server-control';
import { WORK } from './web.bench';

interface Scores { performance: number; accessibility: number; finalUrl: string; failing: string[] }

/** Lighthouse's default (mobile, simulated slow 4G) on the sign-in screen and, signed in, the musician's today. */
export const lighthouseBench: Bench = {
  name: 'Lighthouse',
  run: async ({ server }) => {
    if (!server) throw new Error('Lighthouse needs the server');
    const cookie = await signIn(server.url, musicianEmail(2), BENCH_PASSWORD);
    const rows: Row[] = [];
    for (const [screen, url, args] of [
      ['sign-in', `${server.url}/sign-in`, []],
      ['today (signed in)', `${server.url}/home`, [cookie]],
    ] as const) {
      const report = path.join(WORK, `lighthouse-${screen.split(' ')[0]}.json`);
      const env = { ...process.env, LIGHTHOUSE_REPORT: report };
      const out = execFileSync(process.execPath, [path.join(__dirname, 'lighthouse-run.mjs'), url, ...args], { encoding: 'utf8', timeout: 180_000, env });
      const scores = JSON.parse(out.trim().split('\n').at(-1) ?? '{}') as Scores;
      console.error(`lighthouse ${screen}: ${scores.finalUrl}; below 0.9: ${scores.failing.join(', ')}; report in ${report}`);
      rows.push({ area: 'web', measure: `Lighthouse mobile, ${screen}: performance / accessibility`, ours: `${scores.performance} / ${scores.accessibility}`, baseline: '', ratio: '', budget: '>= 90 each', verdict: verdict(scores.performance >= 90 && scores.accessibility >= 90) });
    }
    return rows;
  },
};
