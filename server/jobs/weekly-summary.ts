import { Cron } from 'croner';
import type { Db } from '../db/client';
import type { Mailer } from '../lib/mailer';
import { sendWeeklySummaries } from '../services/summary.service';

/**
 * Schedules the weekly caseload summary (croner). Started from server/index.ts only, so tests and
 * createApp never start timers. `protect` skips a run while the previous one is still going.
 */
export function startWeeklySummaryJob(deps: { db: Db; mailer: Mailer; publicUrl: string; pattern: string; timeZone: string }): Cron {
  return new Cron(deps.pattern, { timezone: deps.timeZone, protect: true, name: 'weekly-summary' }, async () => {
    const results = await sendWeeklySummaries(deps, new Date());
    console.log(`[summary] weekly summaries sent: ${results.filter((r) => r.sent).length}`);
  });
}
