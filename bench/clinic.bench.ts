import { BENCH_PASSWORD, clinicianEmail, musicianEmail } from './clinic-db';
import { info, measureAsync, ms, verdict, type Bench, type Row } from './harness';
import { checkQueryPlans } from './query-plans';
import { getOk, signIn } from './server-control';

// Requests go one at a time over loopback, so each figure is one request's latency including HTTP.
const BUDGET_MS = 20;

export const clinicBench: Bench = {
  name: 'clinic scale',
  run: async ({ quick, server }) => {
    if (!server) throw new Error('clinic bench needs the server');
    const { url, bareUrl, dbFile } = server;
    const people = quick ? 3 : 6;
    const clinicians = await Promise.all(Array.from({ length: people }, (_, i) => signIn(url, clinicianEmail(i), BENCH_PASSWORD)));
    const musicians = await Promise.all(Array.from({ length: people }, (_, i) => signIn(url, musicianEmail(i), BENCH_PASSWORD)));
    const next = <T>(list: T[], n: number): T => list[n % list.length] as T;

    // The first read of each caseload replays every musician through the engine (nothing cached yet).
    const cold: number[] = [];
    const ids: { cookie: string; id: string }[] = [];
    for (const cookie of clinicians) {
      const t0 = performance.now();
      const list = (await getOk(`${url}/api/musicians`, cookie)) as { id: string }[];
      cold.push(performance.now() - t0);
      ids.push(...list.map(({ id }) => ({ cookie, id })));
    }
    const runs = quick ? 60 : 300;
    let n = 0;
    const caseload = await measureAsync(() => getOk(`${url}/api/musicians`, next(clinicians, (n += 1))), { runs });
    const record = await measureAsync(() => {
      const pick = next(ids, (n += 7));
      return getOk(`${url}/api/musicians/${pick.id}`, pick.cookie);
    }, { runs });
    const today = await measureAsync(() => getOk(`${url}/api/today`, next(musicians, (n += 1))), { runs });
    const bare = await measureAsync(() => getOk(`${bareUrl}/fixed`, ''), { runs });
    const plans = await checkQueryPlans(dbFile);

    const row = (measure: string, t: { p50: number; p99: number }): Row => ({
      area: 'clinic',
      measure: `${measure}: p50 / p99`,
      ours: `${ms(t.p50)} / ${ms(t.p99)}`,
      baseline: `bare Express ${ms(bare.p50)} / ${ms(bare.p99)}`,
      ratio: '',
      budget: `p50 < ${BUDGET_MS} ms`,
      verdict: verdict(t.p50 < BUDGET_MS),
    });
    return [
      row(`caseload (${ids.length / people} musicians)`, caseload),
      info('clinic', 'caseload, first read of the day (engine for every musician): mean', ms(cold.reduce((a, b) => a + b, 0) / cold.length)),
      row('musician record', record),
      row("today's session", today),
      {
        area: 'clinic',
        measure: `query plans on these paths (${plans.statements} statements)`,
        ours: plans.scans.length === 0 ? 'no scans of big tables' : plans.scans.join('; '),
        baseline: '',
        ratio: '',
        budget: 'no full scans',
        verdict: verdict(plans.scans.length === 0),
      },
    ];
  },
};
