/** A tiny timing harness: warm up, then time many runs and report the median and 95th percentile. */
export type BenchResult = { name: string; runs: number; medianMs: number; p95Ms: number; targetMs?: number; note?: string };

export type Bench = { name: string; run: () => Promise<BenchResult> | BenchResult };

export function measure(name: string, fn: () => unknown, opts: { runs?: number; warmup?: number; targetMs?: number } = {}): BenchResult {
  const runs = opts.runs ?? 200;
  for (let i = 0; i < (opts.warmup ?? 20); i += 1) fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  const at = (q: number) => times[Math.min(times.length - 1, Math.floor(q * times.length))] ?? Number.NaN;
  return { name, runs, medianMs: at(0.5), p95Ms: at(0.95), ...(opts.targetMs !== undefined ? { targetMs: opts.targetMs } : {}) };
}

export function report(result: BenchResult): string {
  const verdict = result.targetMs === undefined ? '' : result.p95Ms < result.targetMs ? `  (target < ${result.targetMs} ms: met)` : `  (target < ${result.targetMs} ms: MISSED)`;
  return `${result.name}: median ${result.medianMs.toFixed(3)} ms, p95 ${result.p95Ms.toFixed(3)} ms over ${result.runs} runs${verdict}${result.note ? `\n  ${result.note}` : ''}`;
}
