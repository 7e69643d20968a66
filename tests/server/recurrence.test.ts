import { expandRule } from '@/server/lib/recurrence';

// RFC 5545, section 3.8.5.3 "Recurrence Rule", examples with DTSTART 19970902T090000 America/New_York.
const NY = 'America/New_York';
const localDates = (instants: string[]) =>
  instants.map((iso) => new Intl.DateTimeFormat('en-CA', { timeZone: NY, month: '2-digit', day: '2-digit' }).format(new Date(iso)));
const localTimes = (instants: string[]) =>
  instants.map((iso) => new Intl.DateTimeFormat('en-GB', { timeZone: NY, hour: '2-digit', minute: '2-digit' }).format(new Date(iso)));

describe('recurrence rules (RFC 5545 section 3.8.5.3 examples)', () => {
  it('expands daily for 10 occurrences (FREQ=DAILY;COUNT=10)', () => {
    const dates = localDates(expandRule('FREQ=DAILY;COUNT=10', { date: '1997-09-02', time: '09:00' }, NY));
    expect(dates).toEqual(['09-02', '09-03', '09-04', '09-05', '09-06', '09-07', '09-08', '09-09', '09-10', '09-11']);
  });

  it('expands weekly on Tuesday and Thursday for 10 occurrences', () => {
    const dates = localDates(expandRule('FREQ=WEEKLY;COUNT=10;WKST=SU;BYDAY=TU,TH', { date: '1997-09-02', time: '09:00' }, NY));
    expect(dates).toEqual(['09-02', '09-04', '09-09', '09-11', '09-16', '09-18', '09-23', '09-25', '09-30', '10-02']);
  });

  it('expands every other week on Monday, Wednesday and Friday until 24 Dec 1997, across the clock change', () => {
    const instants = expandRule('FREQ=WEEKLY;INTERVAL=2;UNTIL=19971224T000000Z;WKST=SU;BYDAY=MO,WE,FR', { date: '1997-09-01', time: '09:00' }, NY);
    expect(localDates(instants)).toEqual([
      '09-01', '09-03', '09-05', '09-15', '09-17', '09-19', '09-29',
      '10-01', '10-03', '10-13', '10-15', '10-17', '10-27', '10-29', '10-31',
      '11-10', '11-12', '11-14', '11-24', '11-26', '11-28',
      '12-08', '12-10', '12-12', '12-22',
    ]);
    // 09:00 local throughout: EDT (UTC-4) in September, EST (UTC-5) from 26 October 1997.
    expect(new Set(localTimes(instants))).toEqual(new Set(['09:00']));
    expect(instants[0]).toBe('1997-09-01T13:00:00.000Z');
    expect(instants.at(-1)).toBe('1997-12-22T14:00:00.000Z');
  });

  it('expands every 15 minutes for 6 occurrences (FREQ=MINUTELY;INTERVAL=15;COUNT=6)', () => {
    const times = localTimes(expandRule('FREQ=MINUTELY;INTERVAL=15;COUNT=6', { date: '1997-09-02', time: '09:00' }, NY));
    expect(times).toEqual(['09:00', '09:15', '09:30', '09:45', '10:00', '10:15']);
  });

  it('lets WKST change the result (FREQ=WEEKLY;INTERVAL=2;COUNT=4;BYDAY=TU,SU)', () => {
    const start = { date: '1997-08-05', time: '09:00' };
    expect(localDates(expandRule('FREQ=WEEKLY;INTERVAL=2;COUNT=4;BYDAY=TU,SU;WKST=MO', start, NY))).toEqual(['08-05', '08-10', '08-19', '08-24']);
    expect(localDates(expandRule('FREQ=WEEKLY;INTERVAL=2;COUNT=4;BYDAY=TU,SU;WKST=SU', start, NY))).toEqual(['08-05', '08-17', '08-19', '08-31']);
  });
});
