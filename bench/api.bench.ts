import autocannon from 'autocannon';
import { BENCH_PASSWORD, clinicianEmail, musicianEmail } from './clinic-db';
import { ms, ratio, verdict, type Bench, type Row } from './harness';
import { signIn } from './server-control';

// Load goes to loopback only, for a fixed time with a fixed number of connections, and stops by itself.
const CONNECTIONS = 10;

export const apiBench: Bench = {
  name: 'API throughput',
  run: async ({ quick, server }) => {
    if (!server) throw new Error('API bench needs the server');
    const duration = quick ? 3 : 8;
    const musician = await signIn(server.url, musicianEmail(1), BENCH_PASSWORD);
    const clinician = await signIn(server.url, clinicianEmail(1), BENCH_PASSWORD);
    const load = async (url: string, cookie?: string) => {
      const result = await autocannon({ url, connections: CONNECTIONS, duration, ...(cookie ? { headers: { cookie } } : {}) });
      if (result.non2xx > 0 || result.errors > 0) throw new Error(`${url}: ${result.non2xx} non-2xx, ${result.errors} errors`);
      return result;
    };
    const bare = await load(`${server.bareUrl}/fixed`);
    const today = await load(`${server.url}/api/today`, musician);
    const caseload = await load(`${server.url}/api/musicians`, clinician);
    const line = (r: { requests: { average: number }; latency: { p50: number; p99: number } }) =>
      `${r.requests.average.toFixed(0)} req/s, ${ms(r.latency.p50)} / ${ms(r.latency.p99)}`;
    const rows: Row[] = [
      {
        area: 'API',
        measure: `today's session, ${CONNECTIONS} connections ${duration} s: req/s, p50 / p99`,
        ours: line(today),
        baseline: `bare Express ${line(bare)}`,
        ratio: ratio(today.requests.average, bare.requests.average),
        budget: '>= 0.5x',
        verdict: verdict(today.requests.average / bare.requests.average >= 0.5),
      },
      {
        area: 'API',
        measure: `caseload of 50, ${CONNECTIONS} connections ${duration} s: req/s, p50 / p99`,
        ours: line(caseload),
        baseline: `bare Express ${line(bare)}`,
        ratio: ratio(caseload.requests.average, bare.requests.average),
        budget: '',
        verdict: '',
      },
    ];
    return rows;
  },
};
