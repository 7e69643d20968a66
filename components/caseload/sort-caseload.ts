import type { CaseloadEntry, CaseloadQuery } from '@/shared/schemas/musician';

export type CaseloadSort = CaseloadQuery['sort'];

/** Urgent alerts outrank any number of warnings; then more alerts first. */
function alertRank(entry: CaseloadEntry): number {
  const urgent = entry.alerts.filter((alert) => alert.severity === 'urgent').length;
  return urgent * 100 + entry.alerts.length;
}

const byName = (a: CaseloadEntry, b: CaseloadEntry) => a.name.localeCompare(b.name);

/**
 * The server already sorts; the same order is kept on the device so a list refreshed from the cache
 * (or from an older server) still puts people needing attention first. Missing values go last.
 */
export function sortCaseload(entries: readonly CaseloadEntry[], sort: CaseloadSort): CaseloadEntry[] {
  const list = [...entries];
  switch (sort) {
    case 'alerts':
      return list.sort((a, b) => alertRank(b) - alertRank(a) || byName(a, b));
    case 'event':
      return list.sort((a, b) => (a.plan?.event.date ?? '9999').localeCompare(b.plan?.event.date ?? '9999') || byName(a, b));
    case 'last_check_in':
      return list.sort((a, b) => (b.lastCheckInDate ?? '').localeCompare(a.lastCheckInDate ?? '') || byName(a, b));
    default:
      return list.sort(byName);
  }
}
