import { defaultPlanSettings, progressionState, sessionsForDate, type Override } from '@/shared/scheduler';
import { cleanSession, followPlan, morning, painfulSession, settingsWith } from './fixtures';

const override = (action: Override['action'], date: string, at = `${date}T18:00:00Z`): Override => ({
  action,
  date,
  reason: 'Reviewed in clinic',
  by: 'Dr Invented',
  at,
});

describe('progression from check-ins', () => {
  const settings = settingsWith();

  it('does move up after 3 clean playing days confirmed by the next morning (BAPAM: 3 to 7 days a level)', () => {
    const state = progressionState({ settings, checkIns: followPlan(settings, '2025-03-03', '2025-03-05'), overrides: [], today: '2025-03-06' });
    expect(state.stageNumber).toBe(2);
    expect(state.history[0]!.message).toBe('Moved up to stage 2 on 6 Mar 2025 after 3 playing days without symptoms.');
  });

  describe('on days of more than one session', () => {
    // Short sessions make every stage's day two sessions, so a day can be left half played.
    const split = settingsWith({ maxSessionMinutes: 5, targetMinutesPerDay: 15 });
    const firstDay = sessionsForDate(split, null, '2025-03-03');

    it('does count a day toward moving up only once all its sessions are played (common practice: the level as prescribed)', () => {
      expect(firstDay.sessions.length).toBe(2);
      const full = followPlan(split, '2025-03-03', '2025-03-05');
      expect(progressionState({ settings: split, checkIns: full, overrides: [], today: '2025-03-06' }).stageNumber).toBe(2);

      // The third day with its second session never played: still stage 1, and the history says why.
      const short = full.filter((c) => !(c.kind === 'session' && c.date === '2025-03-05' && c.sessionIndex === 1));
      const state = progressionState({ settings: split, checkIns: short, overrides: [], today: '2025-03-06' });
      expect(state).toMatchObject({ stageNumber: 1, cleanDays: 2 });
      expect(state.history.at(-1)).toMatchObject({ kind: 'short_day', date: '2025-03-05' });
      expect(state.history.at(-1)!.message).toBe('Played 1 of 2 sessions on 5 Mar 2025: a stage moves up on full days only, so this day does not count.');
    });

    it('does not call today short while its later sessions can still be played', () => {
      const today = [...followPlan(split, '2025-03-03', '2025-03-04'), cleanSession('2025-03-05', 5, 0)];
      const midDay = progressionState({ settings: split, checkIns: today, overrides: [], today: '2025-03-05' });
      expect(midDay.history.some((event) => event.kind === 'short_day')).toBe(false);
      expect(midDay.cleanDays).toBe(2);
      const evening = progressionState({ settings: split, checkIns: [...today, cleanSession('2025-03-05', 5, 1)], overrides: [], today: '2025-03-05' });
      expect(evening.cleanDays).toBe(3);
    });
  });

  it('does not move up when the next-morning check of the third day is missing (symptoms may come the next day: BAPAM)', () => {
    const checkIns = followPlan(settings, '2025-03-03', '2025-03-05').filter((c) => c.date !== '2025-03-06');
    const state = progressionState({ settings, checkIns, overrides: [], today: '2025-03-07' });
    expect(state.stageNumber).toBe(1);
  });

  it('does step back one stage and explain why when a gate is over the threshold (BAPAM: back to the previous level)', () => {
    const checkIns = [...followPlan(settings, '2025-03-03', '2025-03-07'), painfulSession('2025-03-08', 4, 2)];
    const state = progressionState({ settings, checkIns, overrides: [], today: '2025-03-08' });
    expect(state.status).toBe('stepped_back');
    expect(state.stageNumber).toBe(1);
    expect(state.history.at(-1)!.message).toBe('Stepped back to stage 1 on 8 Mar 2025: pain 4 after block 2.');
    expect(state.sessionEndedOn).toBe('2025-03-08');
  });

  it('does step back when the next morning has pain even though the session gates passed', () => {
    const checkIns = [...followPlan(settings, '2025-03-03', '2025-03-06'), cleanSession('2025-03-07'), morning('2025-03-08', 2)];
    const state = progressionState({ settings, checkIns, overrides: [], today: '2025-03-08' });
    expect(state.status).toBe('stepped_back');
    expect(state.history.at(-1)!.message).toContain('pain 2 the next morning');
  });

  it('does hold instead of stepping back when two failed days are allowed and one happened', () => {
    const lenient = settingsWith({ failuresBeforeStepBack: 2 });
    const checkIns = [...followPlan(lenient, '2025-03-03', '2025-03-07'), painfulSession('2025-03-08', 3)];
    const state = progressionState({ settings: lenient, checkIns, overrides: [], today: '2025-03-08' });
    expect(state).toMatchObject({ status: 'held', stageNumber: 2 });
  });

  it('does let pain up to the threshold pass when the clinician allows some pain (Silbernagel et al. 2007: up to 5/10)', () => {
    const tolerant = settingsWith({ painThreshold: { session: 5, nextMorning: 0 } });
    const checkIns = [...followPlan(tolerant, '2025-03-03', '2025-03-04'), painfulSession('2025-03-05', 5), morning('2025-03-06')];
    expect(progressionState({ settings: tolerant, checkIns, overrides: [], today: '2025-03-06' }).stageNumber).toBe(2);
  });

  it('does stop all playing when a red flag is reported and restart the stage when the clinician clears it', () => {
    const checkIns = [...followPlan(settings, '2025-03-03', '2025-03-04'), morning('2025-03-05', 0, ['numbness'])];
    const stopped = progressionState({ settings, checkIns, overrides: [], today: '2025-03-05' });
    expect(stopped).toMatchObject({ status: 'stopped', stoppedSince: '2025-03-05', redFlags: ['numbness'] });
    expect(sessionsForDate(settings, stopped, '2025-03-06')).toMatchObject({ kind: 'stopped', sessions: [] });
    expect(stopped.prompts[0]).toContain('prompt clinical review');

    const cleared = progressionState({ settings, checkIns, overrides: [override('clear_red_flag', '2025-03-06')], today: '2025-03-07' });
    expect(cleared.status).toBe('on_track');
    expect(cleared.cleanDays).toBe(0);
    expect(sessionsForDate(settings, cleared, '2025-03-07').sessions).toHaveLength(1);
    expect(cleared.history.at(-1)).toMatchObject({ kind: 'red_flag_cleared', by: 'Dr Invented' });
  });

  it('does keep progression still while a clinician hold stands and move on after resume', () => {
    const checkIns = followPlan(settings, '2025-03-03', '2025-03-06');
    const held = progressionState({ settings, checkIns, overrides: [override('hold', '2025-03-04')], today: '2025-03-07' });
    expect(held).toMatchObject({ status: 'held', stageNumber: 1 });
    const resumed = progressionState({
      settings,
      checkIns,
      overrides: [override('hold', '2025-03-04'), override('resume', '2025-03-06')],
      today: '2025-03-07',
    });
    expect(resumed).toMatchObject({ status: 'on_track', stageNumber: 2 });
  });

  it('does apply a clinician advance and step back from the next day and record who decided', () => {
    const state = progressionState({
      settings,
      checkIns: [],
      overrides: [override('advance', '2025-03-03'), override('advance', '2025-03-04'), override('step_back', '2025-03-05')],
      today: '2025-03-06',
    });
    expect(state.stageNumber).toBe(2);
    expect(state.history.map((h) => h.kind)).toEqual(['clinician_advance', 'clinician_advance', 'clinician_step_back']);
    expect(state.history.every((h) => h.by === 'Dr Invented')).toBe(true);
  });

  it('does note playing beyond the planned minutes when a session runs long (BAPAM: keep to the timings)', () => {
    const state = progressionState({ settings, checkIns: [cleanSession('2025-03-03', 25)], overrides: [], today: '2025-03-03' });
    expect(state.history[0]!.message).toContain('Played 25 minutes on 3 Mar 2025, more than the 10 planned');
  });

  it('does prompt a review when a stage lasts longer than its maximum days', () => {
    const state = progressionState({ settings, checkIns: [], overrides: [], today: '2025-03-12' });
    expect(state.prompts.join(' ')).toContain('longer than the usual 7');
  });

  it('does read today from an instant in the plan zone when given a Date', () => {
    const state = progressionState({ settings, checkIns: [], overrides: [], today: new Date('2025-03-05T23:30:00Z') });
    expect(state.today).toBe('2025-03-05');
  });
});

describe('pain reported outside a session', () => {
  // BAPAM: symptoms during or after playing mean back to the previous level until you can progress.
  it('ends the day and counts as a failed day when over the threshold, and stops on a red flag', () => {
    const settings = defaultPlanSettings({ startDate: '2027-03-01', event: { name: 'Recital', date: '2027-05-01' } });
    const report = (pain: number, redFlags: ('numbness' | 'swelling')[] = []) => ({ kind: 'pain_report' as const, date: '2027-03-02', pain, redFlags });
    const over = progressionState({ settings, checkIns: [report(2)], overrides: [], today: '2027-03-02' });
    expect(over.sessionEndedOn).toBe('2027-03-02');
    expect(over.status).toBe('held');
    expect(over.history.at(-1)?.message).toContain('pain 2 reported outside a session');
    const within = progressionState({ settings: { ...settings, painThreshold: { session: 3, nextMorning: 0 } }, checkIns: [report(2)], overrides: [], today: '2027-03-02' });
    expect(within.status).toBe('on_track');
    expect(within.sessionEndedOn).toBeNull();
    const flagged = progressionState({ settings, checkIns: [report(0, ['swelling'])], overrides: [], today: '2027-03-02' });
    expect(flagged.status).toBe('stopped');
    expect(flagged.stoppedSince).toBe('2027-03-02');
  });
});
