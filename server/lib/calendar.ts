import { getVtimezoneComponent } from '@touch4it/ical-timezones';
import { TZDate } from '@date-fns/tz';
import ical, { ICalAlarmType, ICalEventStatus } from 'ical-generator';

/** One playing session as a calendar event (RFC 5545 VEVENT). */
export interface CalendarSession {
  uid: string;
  sequence: number;
  startsAt: string;
  endsAt: string;
  summary: string;
  description: string;
  cancelled: boolean;
  /** A whole-day event (from the date of startsAt) repeating by this RRULE, e.g. weekly rest days. */
  allDayRule?: string;
}

// A reminder ten minutes before each session: long enough to get the instrument out (common practice).
export const REMINDER_SECONDS = 10 * 60;

/**
 * Writes the sessions as an iCalendar file in the musician's time zone, with a VTIMEZONE so that any
 * client reads the TZID times right, and a DISPLAY alarm (RFC 5545 3.6.6: ACTION, TRIGGER, DESCRIPTION).
 */
export function writeCalendar(input: { name: string; timeZone: string; sessions: CalendarSession[]; url?: string }): string {
  const calendar = ical({
    // ical-generator escapes ; , and \ in the name but not line breaks, which would end the property and
    // let a typed name inject components: a calendar name has no use for control characters anyway.
    name: input.name.replace(/[\u0000-\u001f\u007f]+/g, ' '),
    prodId: { company: 'Ritorno', product: 'Ritorno', language: 'EN' },
    timezone: { name: input.timeZone, generator: getVtimezoneComponent },
    ttl: 60 * 60,
    ...(input.url ? { url: input.url } : {}),
  });
  for (const session of input.sessions) {
    const times = session.allDayRule
      ? { start: new Date(`${session.startsAt.slice(0, 10)}T00:00:00Z`), allDay: true, repeating: session.allDayRule }
      : { start: new TZDate(session.startsAt, input.timeZone), end: new TZDate(session.endsAt, input.timeZone), timezone: input.timeZone };
    const event = calendar.createEvent({
      id: session.uid,
      sequence: session.sequence,
      ...times,
      summary: session.summary,
      description: session.description,
      status: session.cancelled ? ICalEventStatus.CANCELLED : ICalEventStatus.CONFIRMED,
    });
    if (!session.cancelled && !session.allDayRule) {
      event.createAlarm({ type: ICalAlarmType.display, trigger: REMINDER_SECONDS, description: `${session.summary} in 10 minutes` });
    }
  }
  return calendar.toString();
}
