import { addDays, buildStages, defaultPlanSettings, sessionsForRange } from '../shared/scheduler';
import { measure, type Bench } from './harness';

/** An invented plan: 26 weeks from start to event, defaults otherwise. */
const settings = defaultPlanSettings({
  startDate: '2026-01-05',
  event: { name: 'Invented summer recital', date: addDays('2026-01-05', 26 * 7 - 1) },
  targetMinutesPerDay: 180,
  stepMinutes: 5,
  maxWeeklyGrowthPercent: 20,
  maxStageGrowthPercent: 20,
});

export const planBench: Bench = {
  name: '26-week plan with all daily sessions',
  run: () => {
    let sessions = 0;
    const result = measure(
      '26-week plan with all daily sessions',
      () => {
        buildStages(settings);
        const days = sessionsForRange(settings, null, settings.startDate, settings.event.date);
        sessions = days.reduce((n, d) => n + d.sessions.length, 0);
      },
      { runs: 300, warmup: 30, targetMs: 10 },
    );
    return { ...result, note: `${buildStages(settings).length} stages, 182 days, ${sessions} sessions per run` };
  },
};
