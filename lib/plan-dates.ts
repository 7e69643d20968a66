import { format } from 'date-fns/format';
import { daysBetween } from '@/shared/scheduler/dates';

/** A plan date (YYYY-MM-DD) as "12 Mar 2027", read without any time zone shift. */
export function formatPlanDate(date: string): string {
  return format(new Date(`${date}T12:00:00`), 'd MMM yyyy');
}

/** "52 days to go", "Tomorrow", "Today" or "3 days ago", counted from the view's own date. */
export function daysToGo(asOf: string, date: string): string {
  const days = daysBetween(asOf, date);
  if (days === 0) return 'Today';
  if (days === 1) return 'Tomorrow';
  if (days > 1) return `${days} days to go`;
  return days === -1 ? 'Yesterday' : `${-days} days ago`;
}
