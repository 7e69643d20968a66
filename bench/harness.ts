/**
 * A tiny benchmark harness. Every figure is measured beside its baseline in the same run (machines are
 * noisy), and every bench returns rows of one table that run.ts prints and writes to bench/results.md.
 */
export type Verdict = 'met' | 'MISSED' | '';

export interface Row {
  area: string;
  measure: string;
  ours: string;
  baseline: string;
  ratio: string;
  budget: string;
  verdict: Verdict;
}

/** What benches share: the quick flag and, once started, the server under test. */
export interface BenchContext {
  quick: boolean;
  server?: { url: string; bareUrl: string; dbFile: string };
}

export type Bench = { name: string; run: (ctx: BenchContext) => Promise<Row[]> | Row[] };

export interface Timing {
  runs: number;
  p50: number;
  p95: number;
  p99: number;
}

export function percentiles(times: number[]): Timing {
  const sorted = [...times].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? Number.NaN;
  return { runs: sorted.length, p50: at(0.5), p95: at(0.95), p99: at(0.99) };
}

/** Times a synchronous function many times after a warm-up; milliseconds. */
export function measure(fn: () => unknown, opts: { runs?: number; warmup?: number } = {}): Timing {
  for (let i = 0; i < (opts.warmup ?? 20); i += 1) fn();
  const times: number[] = [];
  for (let i = 0; i < (opts.runs ?? 200); i += 1) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  return percentiles(times);
}

/** Same, for a function that returns a promise (one call at a time). */
export async function measureAsync(fn: () => Promise<unknown>, opts: { runs?: number; warmup?: number } = {}): Promise<Timing> {
  for (let i = 0; i < (opts.warmup ?? 10); i += 1) await fn();
  const times: number[] = [];
  for (let i = 0; i < (opts.runs ?? 100); i += 1) {
    const t0 = performance.now();
    await fn();
    times.push(performance.now() - t0);
  }
  return percentiles(times);
}

export const ms = (value: number) => (value >= 100 ? `${value.toFixed(0)} ms` : `${value.toFixed(2)} ms`);
export const ratio = (ours: number, baseline: number) => `${(ours / baseline).toFixed(2)}x`;
export const kb = (bytes: number) => `${(bytes / 1024).toFixed(0)} KB`;
export const verdict = (met: boolean): Verdict => (met ? 'met' : 'MISSED');

/** A row for a figure with no baseline or budget of its own (context for the rows around it). */
export const info = (area: string, measure: string, ours: string, baseline = ''): Row => ({ area, measure, ours, baseline, ratio: '', budget: '', verdict: '' });

export function table(rows: Row[]): string {
  const head = ['area', 'measure', 'Ritorno', 'baseline', 'ratio', 'budget', 'verdict'];
  const cells = (row: Row) => [row.area, row.measure, row.ours, row.baseline, row.ratio, row.budget, row.verdict];
  const lines = [head, head.map(() => '---'), ...rows.map(cells)];
  return lines.map((line) => `| ${line.join(' | ')} |`).join('\n');
}
