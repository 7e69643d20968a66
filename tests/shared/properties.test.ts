import fc from 'fast-check';
import {
  addDays,
  assessFeasibility,
  buildLadder,
  buildStages,
  daysBetween,
  isRestDay,
  localDateOf,
  periodOn,
  progressionState,
  restWeekdaysOf,
  sessionsForDate,
  sessionsForRange,
  tierAtStage,
  toDay,
  TIERS,
  type PlanSettings,
  type Stage,
} from '@/shared/scheduler';
import { checkInsFrom, historyArb, settingsArb } from './arbitraries';

const RUNS = { numRuns: 120 };

function plannedLevel(settings: PlanSettings, stages: Stage[], date: string): number {
  const first = stages[0]!;
  return date < settings.startDate ? first.minutesPerDay : periodOn(stages, date)!.minutesPerDay;
}

describe('scheduler invariants (fast-check)', () => {
  it('does keep every step within the stage cap, the step size and the target whatever the settings', () => {
    fc.assert(
      fc.property(settingsArb, (s) => {
        const stages = buildStages(s);
        stages.slice(1).forEach((stage, i) => {
          const prev = stages[i]!;
          expect(stage.minutesPerDay).toBeGreaterThanOrEqual(prev.minutesPerDay);
          expect(stage.minutesPerDay - prev.minutesPerDay).toBeLessThanOrEqual(s.stepMinutes);
          expect(stage.minutesPerDay).toBeLessThanOrEqual(prev.minutesPerDay * (1 + s.maxStageGrowthPercent / 100) + 1e-9);
          expect(stage.minutesPerDay).toBeLessThanOrEqual(s.targetMinutesPerDay);
        });
      }),
      RUNS,
    );
  });

  it('does offer, when a plan is out of reach, an event date that works and a day before it that does not', () => {
    fc.assert(
      fc.property(settingsArb, (s) => {
        const f = assessFeasibility(s, []);
        fc.pre(!f.feasible);
        const feasibleOn = (date: string) => assessFeasibility({ ...s, event: { ...s.event, date } }, []).feasible;
        expect(feasibleOn(f.earliestFeasibleEventDate)).toBe(true);
        expect(feasibleOn(addDays(f.earliestFeasibleEventDate, -1))).toBe(false);
        expect(f.message).toContain(`an event on or after ${f.earliestFeasibleEventDate}`);
      }),
      RUNS,
    );
  });

  it('does keep planned minutes within the weekly cap of those 7 days earlier on every date', () => {
    fc.assert(
      fc.property(settingsArb, (s) => {
        const stages = buildStages(s);
        for (let d = s.startDate; d <= stages.at(-1)!.startDate; d = addDays(d, 1)) {
          const weekAgo = plannedLevel(s, stages, addDays(d, -7));
          expect(plannedLevel(s, stages, d)).toBeLessThanOrEqual(weekAgo * (1 + s.maxWeeklyGrowthPercent / 100) + 1e-9);
        }
      }),
      RUNS,
    );
  });

  it('does give each stage at least its minimum playing days, rest days not counted', () => {
    fc.assert(
      fc.property(settingsArb, (s) => {
        for (const stage of buildStages(s)) {
          let playing = 0;
          for (let d = toDay(stage.startDate); d <= toDay(stage.endDate); d += 1) if (!isRestDay(s, d)) playing += 1;
          expect(playing).toBeGreaterThanOrEqual(s.minDaysPerStage);
        }
      }),
      RUNS,
    );
  });

  it('does keep blocks, bursts, rests and tiers within the stage on every day of the plan', () => {
    fc.assert(
      fc.property(settingsArb, (s) => {
        const ladder = buildLadder(s);
        const faults: string[] = [];
        const fault = (ok: boolean, what: string, date: string) => {
          if (!ok) faults.push(`${date}: ${what}`);
        };
        for (const day of sessionsForRange(s, null, s.startDate, s.event.date)) {
          const stage = ladder[day.stageIndex ?? 0]!;
          const allowed = TIERS.indexOf(tierAtStage(s, stage.number)!);
          let played = 0;
          for (const session of day.sessions) {
            let run = 0;
            session.items.forEach((item, i) => {
              if (item.kind === 'play' || item.kind === 'burst') {
                run += item.minutes;
                played += item.minutes;
                fault(run <= stage.blockMinutes, `block of ${run} over ${stage.blockMinutes}`, day.date);
                fault(TIERS.indexOf(item.tier!) <= allowed, `tier ${item.tier} above the stage`, day.date);
                const next = session.items.slice(i + 1).find((x) => x.kind !== 'gate');
                const continues = next !== undefined && (next.kind === 'play' || next.kind === 'burst');
                fault(continues || next === undefined || next.kind === 'rest' || next.kind === 'cool_down', `block followed by ${next?.kind}`, day.date);
                if (!continues) run = 0;
              }
              if (item.kind === 'burst') {
                fault(item.minutes <= s.maxBurstMinutes, `burst of ${item.minutes}`, day.date);
                fault(stage.passagesCleared, 'burst before passages are cleared', day.date);
              }
              if (item.kind === 'rest') fault(item.minutes * 5 >= stage.blockMinutes, `rest of ${item.minutes}`, day.date);
            });
          }
          fault(played === day.playingMinutes, `played ${played} of ${day.playingMinutes}`, day.date);
          fault(day.playingMinutes <= stage.minutesPerDay, 'more than the stage minutes', day.date);
        }
        expect(faults).toEqual([]);
      }),
      RUNS,
    );
  });

  it('does plan no playing on rest days', () => {
    fc.assert(
      fc.property(settingsArb, fc.integer({ min: 0, max: 120 }), (s, offset) => {
        const date = addDays(s.startDate, offset);
        const weekday = ((toDay(date) + 3) % 7) + 1;
        fc.pre(restWeekdaysOf(s).includes(weekday) && date !== s.event.date);
        expect(sessionsForDate(s, null, date)).toMatchObject({ kind: 'rest', sessions: [], playingMinutes: 0 });
      }),
      RUNS,
    );
  });

  it('does give the same output when given the same inputs in another order', () => {
    fc.assert(
      fc.property(settingsArb, historyArb(), fc.integer({ min: 0, max: 90 }), (s, events, todayOffset) => {
        const checkIns = checkInsFrom(s, events);
        const today = addDays(s.startDate, todayOffset);
        const a = progressionState({ settings: s, checkIns, overrides: [], today });
        const b = progressionState({ settings: s, checkIns: [...checkIns].reverse(), overrides: [], today });
        expect(b).toEqual(a);
        expect(sessionsForDate(s, b, today)).toEqual(sessionsForDate(s, a, today));
      }),
      RUNS,
    );
  });

  it('does hold or step back when the last thing recorded is a failed gate', () => {
    fc.assert(
      fc.property(settingsArb, historyArb(), (s, events) => {
        const day = events.length;
        fc.pre(!isRestDay(s, toDay(addDays(s.startDate, day))));
        const checkIns = checkInsFrom(s, [...events.map((e) => (e === 'morning_pain' ? 'clean' : e)), 'pain']).filter(
          (c) => c.date <= addDays(s.startDate, day),
        );
        const state = progressionState({ settings: s, checkIns, overrides: [], today: addDays(s.startDate, day) });
        expect(['held', 'stepped_back']).toContain(state.status);
        expect(state.history.at(-1)!.kind).toMatch(/^(held|stepped_back)$/);
      }),
      RUNS,
    );
  });

  it('does stop all playing when any red flag is reported and not cleared', () => {
    fc.assert(
      fc.property(settingsArb, historyArb(30), fc.integer({ min: 0, max: 30 }), fc.integer({ min: 0, max: 20 }), (s, events, flagOffset, after) => {
        const flagDate = addDays(s.startDate, flagOffset);
        const checkIns = [...checkInsFrom(s, events), { kind: 'next_morning' as const, date: flagDate, pain: 0, redFlags: ['weakness' as const] }];
        const today = addDays(flagDate, after);
        const state = progressionState({ settings: s, checkIns, overrides: [], today });
        expect(state.status).toBe('stopped');
        expect(sessionsForDate(s, state, today).sessions).toEqual([]);
      }),
      RUNS,
    );
  });

  it('does project no remaining stage before today and keep minutes monotone between step backs', () => {
    fc.assert(
      fc.property(settingsArb, historyArb(), fc.integer({ min: 0, max: 90 }), (s, events, todayOffset) => {
        const today = addDays(s.startDate, todayOffset);
        const state = progressionState({ settings: s, checkIns: checkInsFrom(s, events), overrides: [], today });
        const ladder = buildLadder(s);
        for (const p of state.periods.filter((x) => x.kind === 'projected')) expect(p.startDate >= today).toBe(true);
        let drops = 0;
        state.periods.slice(1).forEach((p, i) => {
          if (ladder[p.stageIndex]!.minutesPerDay < ladder[state.periods[i]!.stageIndex]!.minutesPerDay) drops += 1;
        });
        expect(drops).toBeLessThanOrEqual(state.history.filter((h) => h.kind === 'stepped_back').length);
        expect(state.feasibility.targetReachedOn >= s.startDate).toBe(true);
      }),
      RUNS,
    );
  });

  it('does start sessions at their local time and date across daylight-saving changes', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('Europe/London', 'America/New_York'),
        fc.integer({ min: 0, max: 3 * 365 }),
        (timeZone, offset) => {
          const s = { ...buildSettingsFor(timeZone) };
          const date = addDays(s.startDate, offset);
          const day = sessionsForDate(s, { periods: [{ stageIndex: 0, startDate: s.startDate, endDate: addDays(s.startDate, 4000) }] }, date);
          for (const session of day.sessions) {
            const instant = new Date(session.startsAt);
            expect(localDateOf(instant, timeZone)).toBe(date);
            const hm = new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(instant);
            expect(hm).toBe(session.startTime);
          }
          expect(daysBetween(s.startDate, date)).toBe(offset);
        },
      ),
      RUNS,
    );
  });
});

function buildSettingsFor(timeZone: string): PlanSettings {
  return fc.sample(settingsArb, { seed: 7, numRuns: 1 }).map((s) => ({ ...s, timeZone, restWeekdays: [], restDaysPerWeek: 0 }))[0]!;
}
