import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { apiBench } from './api.bench';
import { calendarBench } from './calendar.bench';
import { clinicBench } from './clinic.bench';
import { generateClinic, type ClinicScale } from './clinic-db';
import { info, table, type Bench, type BenchContext, type Row } from './harness';
import { lighthouseBench } from './lighthouse.bench';
import { planBench } from './plan.bench';
import { startServer } from './server-control';
import { bundleBench, exportWeb, WEB_DIR, WORK } from './web.bench';

/** `npm run bench` (about four minutes) or `npm run bench -- --quick` (a tenth of the clinic, shorter runs). */
const PORT = 8161;

async function main(): Promise<void> {
  const ctx: BenchContext = { quick: process.argv.includes('--quick') };
  const scale: ClinicScale = ctx.quick ? { clinicians: 20, musicians: 1_000, checkIns: 100_000 } : { clinicians: 200, musicians: 10_000, checkIns: 1_000_000 };
  const rows: Row[] = [];
  const runAll = async (benches: Bench[]) => {
    for (const bench of benches) {
      console.error(`bench: ${bench.name}`);
      try {
        rows.push(...(await bench.run(ctx)));
      } catch (error) {
        // One broken bench still leaves the others' figures in the table, and says what broke.
        rows.push({ ...info(bench.name, 'could not run', String(error).split('\n')[0] ?? ''), verdict: 'MISSED' });
      }
    }
  };
  await runAll([planBench, calendarBench]);

  fs.mkdirSync(WORK, { recursive: true });
  const dbFile = path.join(WORK, 'clinic.db');
  console.error('bench: generating the clinic database');
  const generated = await generateClinic(dbFile, scale);
  rows.push(info('clinic', `generated: ${scale.musicians} musicians, ${scale.clinicians} clinicians, ${scale.checkIns} check-ins`, `${generated.seconds.toFixed(1)} s, ${(generated.bytes / 2 ** 20).toFixed(0)} MB`));
  console.error('bench: exporting the web app');
  exportWeb();

  const server = await startServer({ port: PORT, dbFile, webDir: WEB_DIR });
  try {
    ctx.server = { url: server.url, bareUrl: server.bareUrl, dbFile };
    await runAll([clinicBench, apiBench, bundleBench, lighthouseBench]);
  } finally {
    await server.stop();
  }

  const cpu = os.cpus()[0]?.model ?? 'unknown CPU';
  const header = [
    '# Benchmark results',
    '',
    `Written by \`npm run bench${ctx.quick ? ' -- --quick' : ''}\` on ${new Date().toISOString().slice(0, 10)}: Node ${process.version}, ${os.cpus().length} x ${cpu}, ${os.platform()}.`,
    'Each figure beside its baseline from the same run; budgets in the README ("Performance budgets").',
    '',
  ].join('\n');
  const output = table(rows);
  console.log(output);
  fs.writeFileSync(path.join(__dirname, 'results.md'), `${header}${output}\n`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
