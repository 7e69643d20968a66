import { z } from 'zod';

/** A calendar date in the plan's own time zone, `YYYY-MM-DD`. */
export const LocalDateSchema = z.iso.date({ message: 'Use a date as YYYY-MM-DD' });
export type LocalDate = z.infer<typeof LocalDateSchema>;

/** A wall-clock time in the plan's own time zone, `HH:mm`. */
export const LocalTimeSchema = z
  .string()
  .regex(/^([01]\d|2[0-3]):[0-5]\d$/, { message: 'Use a time as HH:mm' });

function isTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

/** An IANA time zone name this runtime knows, e.g. `Europe/London`. */
export const TimeZoneSchema = z.string().refine(isTimeZone, 'Unknown time zone');
