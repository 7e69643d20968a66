import { tzOffset } from '@date-fns/tz';

/**
 * Plan dates are `YYYY-MM-DD` strings in the plan's own time zone. Arithmetic runs on whole day
 * numbers (days since 1970-01-01) so that it never depends on the process time zone or on
 * daylight-saving changes; only `localDateOf` and `instantOf` touch the zone.
 */
export type DayNumber = number;

const MS_PER_DAY = 86_400_000;

export function toDay(date: string): DayNumber {
  const y = Number(date.slice(0, 4));
  const m = Number(date.slice(5, 7));
  const d = Number(date.slice(8, 10));
  return Math.round(Date.UTC(y, m - 1, d) / MS_PER_DAY);
}

export function fromDay(day: DayNumber): string {
  return new Date(day * MS_PER_DAY).toISOString().slice(0, 10);
}

export function addDays(date: string, days: number): string {
  return fromDay(toDay(date) + days);
}

export function daysBetween(from: string, to: string): number {
  return toDay(to) - toDay(from);
}

/** ISO weekday: 1 = Monday ... 7 = Sunday. 1970-01-01 was a Thursday. */
export function isoWeekday(day: DayNumber): number {
  return (((day + 3) % 7) + 7) % 7 + 1;
}

// Building an Intl formatter is the slow part of reading a date in a zone: one per zone, kept.
const dayFormats = new Map<string, Intl.DateTimeFormat>();

function dayFormatOf(timeZone: string): Intl.DateTimeFormat {
  let found = dayFormats.get(timeZone);
  if (!found) {
    // Throws RangeError for an unknown zone, as a TZDate in it would fail to format.
    found = new Intl.DateTimeFormat('en-US', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit', calendar: 'gregory', numberingSystem: 'latn' });
    dayFormats.set(timeZone, found);
  }
  return found;
}

// Zone offsets (and their changes) have fallen on whole minutes everywhere since 1972, so within one minute every instant has the same
// local date: the last answer per zone is kept for the minute it was asked in.
const lastAnswers = new Map<string, { minute: number; date: string }>();

/** The local calendar date of an instant in a time zone. */
export function localDateOf(instant: Date, timeZone: string): string {
  const minute = Math.floor(instant.getTime() / 60_000);
  const last = lastAnswers.get(timeZone);
  if (last?.minute === minute) return last.date;
  const date = formatLocalDate(instant, timeZone);
  lastAnswers.set(timeZone, { minute, date });
  return date;
}

function formatLocalDate(instant: Date, timeZone: string): string {
  let year = '';
  let month = '';
  let day = '';
  for (const part of dayFormatOf(timeZone).formatToParts(instant)) {
    if (part.type === 'year') year = part.value.padStart(4, '0');
    else if (part.type === 'month') month = part.value;
    else if (part.type === 'day') day = part.value;
  }
  return `${year}-${month}-${day}`;
}

/** Today's plan date: a `YYYY-MM-DD` string is taken as is, an instant is read in the plan's zone. */
export function planToday(today: string | Date, timeZone: string): string {
  return typeof today === 'string' ? today.slice(0, 10) : localDateOf(today, timeZone);
}

/**
 * The instant (ISO, UTC) of a local date and `HH:mm` time in a time zone, plus some minutes.
 * Two passes of the zone offset, so a time just after a daylight-saving change gets the new offset;
 * a local time inside the spring-forward gap moves forward by the gap.
 */
export function instantOf(date: string, time: string, timeZone: string, plusMinutes = 0): string {
  const [h = 0, m = 0] = time.split(':').map(Number);
  const asUtc = Date.UTC(Number(date.slice(0, 4)), Number(date.slice(5, 7)) - 1, Number(date.slice(8, 10)), h, m);
  const first = tzOffset(timeZone, new Date(asUtc));
  let utc = asUtc - first * 60_000;
  const second = tzOffset(timeZone, new Date(utc));
  if (second !== first) {
    const alt = asUtc - second * 60_000;
    // Inside a spring-forward gap neither offset fits: take the later instant (the clock moved on).
    utc = tzOffset(timeZone, new Date(alt)) === second ? alt : Math.max(utc, alt);
  }
  return new Date(utc + plusMinutes * 60_000).toISOString();
}
