import { dailyLoads, ewmaRatio, ewmaSeries, loadWarning, rollingRatio, sessionLoad } from '@/shared/scheduler';
import { cleanSession } from './fixtures';

/** 28 daily loads whose weekly sums are the given four numbers (spread over 7 days). */
function weeks(...sums: number[]): number[] {
  return sums.flatMap((sum) => Array.from({ length: 7 }, () => sum / 7));
}

describe('session load (Foster C et al. 2001, J Strength Cond Res 15(1):109-115)', () => {
  it('does give 420 units when 60 minutes are rated 7 on CR-10', () => {
    expect(sessionLoad(7, 60)).toBe(420);
  });

  it('does sum minutes and loads per day when check-ins are recorded', () => {
    const a = { ...cleanSession('2025-03-03', 20), effort: 4 };
    const b = { ...cleanSession('2025-03-03', 10), sessionIndex: 1, effort: undefined };
    const days = dailyLoads([a, b], '2025-03-02', '2025-03-03');
    expect(days).toEqual([
      { date: '2025-03-02', minutes: 0, load: 0, sessionsWithoutEffort: 0 },
      { date: '2025-03-03', minutes: 30, load: 80, sessionsWithoutEffort: 1 },
    ]);
  });
});

describe('rolling acute:chronic ratio (Hulin BT et al. 2014, Br J Sports Med 48(8):708-712)', () => {
  it('does give 900/675 = 1.33 coupled when weekly loads are 600, 600, 600, 900 (worked arithmetic, derived)', () => {
    const r = rollingRatio(weeks(600, 600, 600, 900), 'coupled')!;
    expect(r.acute).toBeCloseTo(900, 9);
    expect(r.chronic).toBeCloseTo(675, 9);
    expect(r.ratio).toBeCloseTo(1.3333, 4);
  });

  it('does give 900/600 = 1.50 uncoupled when weekly loads are 600, 600, 600, 900 (worked arithmetic, derived)', () => {
    expect(rollingRatio(weeks(600, 600, 600, 900), 'uncoupled')!.ratio).toBeCloseTo(1.5, 9);
  });

  it('does use only the last 28 days when more history is given (acute 1 week, chronic 4 weeks)', () => {
    const loads = [...weeks(5000), ...weeks(600, 600, 600, 900)];
    expect(rollingRatio(loads)!.ratio).toBeCloseTo(1.3333, 4);
  });

  it('does give no ratio when fewer than 28 days are known', () => {
    expect(rollingRatio(weeks(600, 600, 900))).toBeNull();
  });
});

describe('EWMA ratio (Williams S et al. 2017, Br J Sports Med 51(3):209; lambda = 2/(N+1))', () => {
  it('does follow the recurrence by hand when N = 7 (lambda 0.25) from a zero start', () => {
    // 0.25*100 = 25; 0.25*0 + 0.75*25 = 18.75; 0.25*200 + 0.75*18.75 = 64.0625
    expect(ewmaSeries([100, 0, 200], 7)).toEqual([25, 18.75, 64.0625]);
  });

  it('does use lambda = 2/29 when N = 28', () => {
    expect(ewmaSeries([290], 28)[0]).toBeCloseTo(20, 9);
  });

  it('does give a ratio of 1 when the load has been constant for a long time', () => {
    const r = ewmaRatio(Array.from({ length: 400 }, () => 300))!;
    expect(r.ratio).toBeCloseTo(1, 6);
  });

  it('does rise above 1 when the last week is heavier than before', () => {
    expect(ewmaRatio(weeks(600, 600, 600, 900))!.ratio).toBeGreaterThan(1);
  });
});

describe('soft warnings (Gabbett TJ 2016, Br J Sports Med 50:273-280: 0.8-1.3 sweet spot, >= 1.5 danger)', () => {
  it('does stay quiet when the ratio is inside the range', () => {
    expect(loadWarning(1.0)).toEqual({ level: 'none', ratio: 1.0, message: null });
    expect(loadWarning(1.3).level).toBe('none');
  });

  it('does prompt softly when the ratio is above 1.3', () => {
    const w = loadWarning(1.33);
    expect(w.level).toBe('above_range');
    expect(w.message).toContain('1.33');
    expect(w.message).toContain('not a verdict');
  });

  it('does prompt more strongly when the ratio reaches 1.5', () => {
    expect(loadWarning(1.5).level).toBe('well_above_range');
    expect(loadWarning(1.49).level).toBe('above_range');
  });
});
