import type { Role } from '../schemas/role';

/**
 * The API reads a page's first draw needs. The server answers them inside the page it sends (rendered with
 * their data, and the data itself for the app to take over from), so a phone on a slow connection sees
 * the page before the app's script has arrived; the app never asks for them a second time.
 */
export type FirstRead = '/api/me' | '/api/today' | '/api/me/musician';

/** Each answered read, as the API itself would answer it (JSON). A read left out is asked for as usual. */
export type FirstReads = Partial<Record<FirstRead, unknown>>;

/** The account is read on every signed-in page; these pages read more, for one role. */
export const PAGE_FIRST_READS: Record<string, { role: Role; reads: FirstRead[] }> = {
  '/home': { role: 'musician', reads: ['/api/today', '/api/me/musician'] },
};

/** What the page at `pathname` reads first, for someone with `role`. */
export function firstReadsOf(pathname: string, role: Role): FirstRead[] {
  const page = PAGE_FIRST_READS[pathname];
  return ['/api/me', ...(page && page.role === role ? page.reads : [])];
}
