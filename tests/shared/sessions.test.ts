import { buildStages, localDateOf, sessionsForDate, type SessionItem } from '@/shared/scheduler';
import { settingsWith } from './fixtures';

const kinds = (items: SessionItem[]) => items.map((i) => i.kind);

describe('daily sessions', () => {
  const settings = settingsWith();

  it('does order gate, warm-up, blocks with gates and rests, then a gate and cool-down when the stage is the first', () => {
    const day = sessionsForDate(settings, null, '2025-03-03');
    expect(kinds(day.sessions[0]!.items)).toEqual(['gate', 'warm_up', 'play', 'gate', 'rest', 'play', 'gate', 'cool_down']);
    const gates = day.sessions[0]!.items.filter((i) => i.kind === 'gate').map((i) => i.gate);
    expect(gates).toEqual([{ position: 'before' }, { position: 'between', afterBlock: 1 }, { position: 'after', afterBlock: 2 }]);
  });

  it('does give items consecutive start minutes when a session is laid out', () => {
    const items = sessionsForDate(settings, null, '2025-03-03').sessions[0]!.items;
    items.slice(1).forEach((item, i) => {
      const prev = items[i]!;
      expect(item.startMinute).toBe(prev.startMinute + prev.minutes);
    });
  });

  it('does interleave bursts of at most 2 minutes with easy material when passages are cleared', () => {
    const stage = buildStages(settings).find((s) => s.passagesCleared)!;
    const day = sessionsForDate(settings, null, stage.startDate);
    const items = day.sessions.flatMap((s) => s.items);
    const bursts = items.filter((i) => i.kind === 'burst');
    expect(bursts.length).toBeGreaterThan(0);
    for (const b of bursts) expect(b.minutes).toBeLessThanOrEqual(2);
    items.forEach((item, i) => {
      if (item.kind !== 'burst') return;
      expect(items[i - 1]?.kind).toBe('play');
      expect(items[i + 1]?.kind).toBe('play');
    });
  });

  it('does play no bursts when passages are not yet cleared', () => {
    const day = sessionsForDate(settings, null, '2025-03-03');
    expect(day.sessions.flatMap((s) => s.items).some((i) => i.kind === 'burst')).toBe(false);
  });

  it('does split a long day into sessions when it exceeds the minutes of one session', () => {
    const day = sessionsForDate(settings, null, '2025-04-15');
    expect(day.sessions.map((s) => s.playingMinutes)).toEqual([45, 45]);
    expect(day.sessions.map((s) => s.startTime)).toEqual(['10:00', '14:00']);
  });

  it('does plan nothing when the date is before the start', () => {
    expect(sessionsForDate(settings, null, '2025-03-02')).toMatchObject({ kind: 'before_start', sessions: [] });
  });
});

describe('local dates across daylight-saving changes', () => {
  it('does start at 10:00 London time on both sides of the spring change (Europe/London, 30 Mar 2025)', () => {
    const s = settingsWith({ startDate: '2025-03-24' });
    expect(sessionsForDate(s, null, '2025-03-29').sessions[0]!.startsAt).toBe('2025-03-29T10:00:00.000Z');
    expect(sessionsForDate(s, null, '2025-03-31').sessions[0]!.startsAt).toBe('2025-03-31T09:00:00.000Z');
  });

  it('does start at 10:00 New York time on both sides of the autumn change (America/New_York, 2 Nov 2025)', () => {
    const s = settingsWith({
      startDate: '2025-10-27',
      timeZone: 'America/New_York',
      event: { name: 'Invented fall recital', date: '2025-12-13' },
      restWeekdays: [3],
    });
    expect(sessionsForDate(s, null, '2025-11-01').sessions[0]!.startsAt).toBe('2025-11-01T14:00:00.000Z');
    expect(sessionsForDate(s, null, '2025-11-02').sessions[0]!.startsAt).toBe('2025-11-02T15:00:00.000Z');
  });

  it('does read today in the plan zone when an instant is given near midnight', () => {
    // 23:30 UTC on 1 Nov 2025 is still 1 Nov in New York but 2 Nov in Tokyo.
    const instant = new Date('2025-11-01T23:30:00Z');
    expect(localDateOf(instant, 'America/New_York')).toBe('2025-11-01');
    expect(localDateOf(instant, 'Asia/Tokyo')).toBe('2025-11-02');
  });
});
