import {
  addDays,
  assessFeasibility,
  buildStages,
  planSummary,
  progressionState,
  sessionsForDate,
  type Piece,
} from '@/shared/scheduler';
import { followPlan, morning, painfulSession, settingsWith } from './fixtures';

/** Invented repertoire for the invented showcase. */
const programme: Piece[] = [
  { title: 'Lantern Air', composer: 'Mira Solvang', tier: 'easy', passages: [], onProgramme: true },
  { title: 'Quay Sonatina', composer: 'Tobias Renk', tier: 'moderate', passages: [], onProgramme: true },
  {
    title: 'Storm Etude',
    composer: 'Ines Valdor',
    tier: 'demanding',
    passages: [{ bars: 'bars 48-72', demands: ['speed', 'stretch'] }],
    onProgramme: true,
  },
  { title: 'Morning Canon', composer: 'Lior Adami', tier: 'easy', passages: [], onProgramme: false },
];

describe('worked scenario: a plan that reaches its target in time', () => {
  const settings = settingsWith({ event: { name: 'Invented spring showcase', date: '2025-05-10' } });

  it('does reach 90 minutes a day and clear the whole programme before the taper', () => {
    const f = assessFeasibility(settings, programme);
    expect(f.feasible).toBe(true);
    expect(f.daysShort).toBe(0);
    expect(f.targetReachedOn <= f.readyBy).toBe(true);
    expect(f.reducedProgramme.ready.map((p) => p.title)).toEqual(['Lantern Air', 'Quay Sonatina', 'Storm Etude']);
  });

  it('does end complete on the day before the event when every day was played without symptoms', () => {
    const checkIns = followPlan(settings, settings.startDate, '2025-05-08');
    const summary = planSummary({ settings, checkIns, overrides: [], pieces: programme, today: '2025-05-09' });
    expect(summary).toMatchObject({
      status: 'complete',
      stageNumber: summary.stageCount,
      minutesPerDay: 90,
      longestBlockMinutes: 25,
      highestTier: 'demanding',
      nextStageStartDate: null,
      daysToEvent: 1,
      feasible: true,
    });
    expect(summary.repertoire.every((r) => r.cleared)).toBe(true);
  });
});

describe('worked scenario: a plan that cannot reach the event', () => {
  const settings = settingsWith({ event: { name: 'Invented spring showcase', date: '2025-03-22' } });

  it('does say how many days short it is and name the reduced programme', () => {
    const f = assessFeasibility(settings, programme);
    expect(f.feasible).toBe(false);
    expect(f.daysShort).toBeGreaterThan(0);
    // By 20 Mar (the last full day before the taper) the plan is at stage 5: moderate cleared, demanding not.
    expect(f.readyBy).toBe('2025-03-20');
    expect(f.reducedProgramme.ready.map((p) => p.title)).toEqual(['Lantern Air', 'Quay Sonatina']);
    expect(f.reducedProgramme.notReady.map((p) => p.title)).toEqual(['Storm Etude']);
    expect(f.minutesReachable).toBeLessThan(90);
    expect(f.message).toContain('days short');
  });

  it('does offer an event date that is feasible under the same caps', () => {
    const f = assessFeasibility(settings, programme);
    const later = settingsWith({ event: { name: 'Invented spring showcase', date: f.earliestFeasibleEventDate } });
    expect(assessFeasibility(later, programme).feasible).toBe(true);
    const dayBefore = settingsWith({ event: { name: 'x', date: addDays(f.earliestFeasibleEventDate, -1) } });
    expect(assessFeasibility(dayBefore, programme).feasible).toBe(false);
  });

  it('does never compress the stages to fit when the event is too close', () => {
    const near = buildStages(settings).map((s) => [s.minutesPerDay, s.startDate]);
    const far = buildStages(settingsWith({ event: { name: 'x', date: '2025-09-01' } })).map((s) => [s.minutesPerDay, s.startDate]);
    expect(near).toEqual(far);
  });
});

describe('worked scenario: a step back after pain in week 2', () => {
  const base = settingsWith();
  const fits = assessFeasibility(base, []);
  // The latest event the untouched plan just makes.
  const settings = settingsWith({ event: { name: 'Invented spring showcase', date: addDays(fits.targetReachedOn, base.taperDays + 1) } });

  it('does move the projected dates later and turn a feasible plan infeasible', () => {
    expect(assessFeasibility(settings, []).feasible).toBe(true);
    const checkIns = [...followPlan(settings, '2025-03-03', '2025-03-10'), painfulSession('2025-03-11', 4, 2)];
    const before = progressionState({ settings, checkIns: checkIns.slice(0, -1), overrides: [], today: '2025-03-11' });
    const after = progressionState({ settings, checkIns, overrides: [], today: '2025-03-11' });
    expect(before.feasibility.feasible).toBe(true);
    expect(after.status).toBe('stepped_back');
    expect(after.feasibility.feasible).toBe(false);
    expect(after.feasibility.targetReachedOn > before.feasibility.targetReachedOn).toBe(true);
    expect(after.history.at(-1)!.message).toBe('Stepped back to stage 1 on 11 Mar 2025: pain 4 after block 2.');
  });
});

describe('worked scenario: a red flag', () => {
  const settings = settingsWith();

  it('does stop playing, alert through a prompt, and show no playing on the landing summary', () => {
    const checkIns = [...followPlan(settings, '2025-03-03', '2025-03-04'), morning('2025-03-05', 3, ['night_pain', 'swelling'])];
    const summary = planSummary({ settings, checkIns, overrides: [], pieces: programme, today: '2025-03-05' });
    expect(summary).toMatchObject({ status: 'stopped', redFlagActive: true, minutesPerDay: 0, highestTier: null });
    expect(summary.lastChange).toContain('night pain, swelling');
    expect(summary.repertoire.some((r) => r.cleared)).toBe(false);
    const state = progressionState({ settings, checkIns, overrides: [], today: '2025-03-05' });
    expect(sessionsForDate(settings, state, '2025-03-05').sessions).toEqual([]);
  });
});

describe('expected dates after a step back', () => {
  it('never projects a piece that is not cleared now onto a date already past', () => {
    const base = settingsWith({ startDate: '2027-03-01', event: { name: 'Recital', date: '2027-06-01' } });
    const clean = followPlan(base, '2027-03-01', '2027-03-11');
    const reached = progressionState({ settings: base, checkIns: clean, overrides: [], today: '2027-03-12' }).stageNumber;
    expect(reached).toBeGreaterThanOrEqual(2);
    // The moderate tier unlocks exactly at the stage reached, so the step back takes it away.
    const settings = { ...base, tierUnlockStage: { easy: 1, moderate: reached, demanding: reached + 1 } };
    const pieces: Piece[] = [{ title: 'Rondo', composer: '', tier: 'moderate', passages: [], onProgramme: true }];
    const before = planSummary({ settings, checkIns: clean, overrides: [], pieces, today: '2027-03-12' });
    expect(before.repertoire[0]?.cleared).toBe(true);
    const after = planSummary({ settings, checkIns: [...clean, painfulSession('2027-03-12', 4)], overrides: [], pieces, today: '2027-03-13' });
    expect(after.status).toBe('stepped_back');
    expect(after.repertoire[0]?.cleared).toBe(false);
    expect(after.repertoire[0]?.expectedOn).not.toBeNull();
    expect((after.repertoire[0]?.expectedOn ?? '') >= '2027-03-13').toBe(true);
  });
});
