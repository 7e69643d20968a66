import * as rruleModule from 'rrule';
import { instantOf } from '../../shared/scheduler';

// rrule ships CommonJS and ESM builds with different shapes: a named export here, a default under ESM.
const { RRule } = (rruleModule as typeof rruleModule & { default?: typeof rruleModule }).RRule
  ? rruleModule
  : ((rruleModule as { default?: typeof rruleModule }).default ?? rruleModule);

/**
 * Expands an RFC 5545 RRULE in a time zone. rrule's own TZID handling depends on the process zone and
 * goes wrong near clock changes, so the rule runs on floating local times (local fields stored as UTC)
 * and each occurrence is then placed in the zone. Returns UTC instants (ISO).
 */
export function expandRule(rule: string, start: { date: string; time: string }, timeZone: string, limit = 1000): string[] {
  const [year, month, day] = start.date.split('-').map(Number);
  const [hour, minute] = start.time.split(':').map(Number);
  const options = RRule.parseString(rule.replace(/^RRULE:/, ''));
  if (options.until) {
    // UNTIL in UTC (RFC 5545 3.3.10) is compared in local wall time, so move it into the zone's fields.
    const localUntil = new Intl.DateTimeFormat('sv-SE', { timeZone, dateStyle: 'short', timeStyle: 'medium', hour12: false }).format(options.until);
    options.until = new Date(`${localUntil.replace(' ', 'T')}Z`);
  }
  const floating = new RRule({
    ...options,
    dtstart: new Date(Date.UTC(year ?? 1970, (month ?? 1) - 1, day ?? 1, hour ?? 0, minute ?? 0)),
    tzid: null,
  });
  return floating
    .all((_date, index) => index < limit)
    .map((local) => {
      const iso = local.toISOString();
      return instantOf(iso.slice(0, 10), iso.slice(11, 16), timeZone);
    });
}
