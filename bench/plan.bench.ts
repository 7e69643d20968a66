import { demoHistory } from '../server/db/demo-history';
import { addDays, buildStages, defaultPlanSettings, progressionState, sessionsForRange } from '../shared/scheduler';
import { measure, ms, ratio, verdict, type Bench, type Row } from './harness';

/** An invented plan: 26 weeks from start to event, defaults otherwise. */
const settings = defaultPlanSettings({
  startDate: '2026-01-05',
  event: { name: 'Invented summer recital', date: addDays('2026-01-05', 26 * 7 - 1) },
  targetMinutesPerDay: 180,
  stepMinutes: 5,
  maxWeeklyGrowthPercent: 20,
  maxStageGrowthPercent: 20,
});

function wholePlan() {
  return { stages: buildStages(settings), days: sessionsForRange(settings, null, settings.startDate, settings.event.date) };
}

// The baseline is serialising the same output to JSON: work the server does anyway to send it, so the
// ratio says how much the computation costs beside merely handing its result over.
export const planBench: Bench = {
  name: 'plan engine',
  run: ({ quick }) => {
    const runs = quick ? 60 : 300;
    const output = wholePlan();
    const sessions = output.days.reduce((n, d) => n + d.sessions.length, 0);
    const plan = measure(wholePlan, { runs, warmup: 30 });
    const planJson = measure(() => JSON.stringify(output), { runs, warmup: 30 });

    const today = addDays(settings.startDate, 180);
    const checkIns = demoHistory(settings, today, [{ playingDaysAgo: 20, afterBlock: 1, pain: 4 }, { playingDaysAgo: 60, afterBlock: 2, pain: 5 }]);
    const replay = measure(() => progressionState({ settings, checkIns, overrides: [], today }), { runs, warmup: 20 });
    const replayJson = measure(() => JSON.stringify(checkIns), { runs, warmup: 20 });
    const rows: Row[] = [
      {
        area: 'engine',
        measure: `26-week plan, all daily sessions (${output.stages.length} stages, ${sessions} sessions): p50 / p95, plans/s`,
        ours: `${ms(plan.p50)} / ${ms(plan.p95)}, ${(1000 / plan.p50).toFixed(0)}/s`,
        baseline: `JSON of the output ${ms(planJson.p50)}`,
        ratio: ratio(plan.p50, planJson.p50),
        budget: 'p95 < 10 ms',
        verdict: verdict(plan.p95 < 10),
      },
      {
        area: 'engine',
        measure: `progression over 180 days (${checkIns.length} check-ins, two pain days): p50 / p95`,
        ours: `${ms(replay.p50)} / ${ms(replay.p95)}`,
        baseline: `JSON of the check-ins ${ms(replayJson.p50)}`,
        ratio: ratio(replay.p50, replayJson.p50),
        budget: '',
        verdict: '',
      },
    ];
    return rows;
  },
};
