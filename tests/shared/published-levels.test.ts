import { BAPAM_SOURCE, RULE_SOURCE, buildStages, publishedLevelsPreset, sessionsForDate, type SessionItem } from '@/shared/scheduler';
import { settingsWith } from './fixtures';

const playAndRest = (items: SessionItem[]) =>
  items.filter((i) => i.kind === 'play' || i.kind === 'rest').map((i) => `${i.kind} ${i.minutes}`);

// BAPAM, "Returning to Playing and Performance for Instrumental Musicians", return-to-play schedule.
describe('published levels preset (BAPAM return-to-play schedule)', () => {
  const settings = settingsWith(publishedLevelsPreset.values);
  const stages = buildStages(settings);

  it('does give level 1 as play 5, rest 60, play 5 when the plan starts', () => {
    const day = sessionsForDate(settings, null, stages[0]!.startDate);
    expect(day.sessions).toHaveLength(1);
    expect(playAndRest(day.sessions[0]!.items)).toEqual(['play 5', 'rest 60', 'play 5']);
    expect(day.playingMinutes).toBe(10);
  });

  it('does give level 2 as play 10, rest 50, play 10 when stage 2 starts', () => {
    const day = sessionsForDate(settings, null, stages[1]!.startDate);
    expect(playAndRest(day.sessions[0]!.items)).toEqual(['play 10', 'rest 50', 'play 10']);
    expect(day.playingMinutes).toBe(20);
  });

  it('does keep each level at least 3 playing days when placed on the calendar (BAPAM: 3 to 7 days)', () => {
    // 2025-03-03 is a Monday; the default rest day is Sunday.
    expect(stages[0]).toMatchObject({ startDate: '2025-03-03', endDate: '2025-03-05' });
    expect(stages[1]!.startDate).toBe('2025-03-06');
  });

  it('does label the published rows with their source and later stages as our own rule', () => {
    expect(stages.slice(0, 2).map((s) => s.basis)).toEqual(['published', 'published']);
    expect(stages[0]!.source).toBe(`${BAPAM_SOURCE}, level 1`);
    expect(stages.slice(2).every((s) => s.basis === 'rule' && s.source === RULE_SOURCE)).toBe(true);
  });
});

// Klickstein G (2009), The Musician's Way, OUP, p. 75: about 10 minutes rest each hour; about a
// 5-minute pause after 25 minutes of solo practice. Peabody "Playing Well": about 5 min every half hour.
describe('break guidance at the target load', () => {
  const settings = settingsWith();
  const stages = buildStages(settings);
  const last = stages[stages.length - 1]!;

  it('does play blocks of at most 25 minutes followed by 5 minutes of rest when the target is reached', () => {
    expect([last.blockMinutes, last.restMinutes]).toEqual([25, 5]);
    const day = sessionsForDate(settings, null, '2025-04-15');
    const items = day.sessions.flatMap((s) => s.items);
    expect(items.filter((i) => i.kind === 'rest').every((i) => i.minutes === 5)).toBe(true);
  });

  it('does rest at least 10 minutes per hour of playing at every stage', () => {
    for (const s of stages) expect(s.restMinutes * 5).toBeGreaterThanOrEqual(s.blockMinutes);
  });
});

// Horvath J, Playing (Less) Hurt: at least one day a week off; no heavy practice the day before or the
// day of a concert.
describe('rest days and the event (Horvath, Playing (Less) Hurt)', () => {
  const settings = settingsWith();

  it('does plan no playing when the day is the weekly rest day', () => {
    const sunday = sessionsForDate(settings, null, '2025-04-13');
    expect(sunday.kind).toBe('rest');
    expect(sunday.sessions).toEqual([]);
  });

  it('does plan a lighter day when it is the day before or the day of the event', () => {
    const normal = sessionsForDate(settings, null, '2025-04-24');
    const before = sessionsForDate(settings, null, '2025-04-25');
    const event = sessionsForDate(settings, null, '2025-04-26');
    expect(normal.playingMinutes).toBe(90);
    expect(before).toMatchObject({ kind: 'taper', playingMinutes: 45 });
    expect(event).toMatchObject({ kind: 'event', playingMinutes: 45 });
    expect(before.sessions.flatMap((s) => s.items).some((i) => i.kind === 'burst')).toBe(false);
  });
});
