import { report, type Bench } from './harness';
import { planBench } from './plan.bench';

/** Every benchmark, in order. Add a bench by writing `<name>.bench.ts` exporting a `Bench` and listing it here. */
const benches: Bench[] = [planBench];

async function main(): Promise<void> {
  for (const bench of benches) console.log(report(await bench.run()));
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
