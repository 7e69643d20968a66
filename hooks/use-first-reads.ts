import { useEffect } from 'react';
import { usePathname } from 'expo-router';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { Role } from '@/shared/schemas/role';
import { musicianHomeQuery } from './use-musician-home';
import { todayQuery } from './use-today';

// What a page's screen reads first, by path and for whom. The same reads the server preloads for that
// page (server/middleware/web-export.ts, FIRST_READS).
const firstReads: Record<string, { role: Role; prefetch: (client: QueryClient) => Promise<void>[] }> = {
  '/home': {
    role: 'musician',
    prefetch: (client) => [client.prefetchQuery(todayQuery), client.prefetchQuery(musicianHomeQuery)],
  },
};

/**
 * Starts a page's first reads as soon as the account is known, not once the signed-in screens' chunk has
 * arrived and run. With the answers already in, the screen draws once, with its data, in a render React
 * can pause for input; answers arriving after it would redraw it in one uninterrupted task.
 */
export function useFirstReads(role: Role | undefined): void {
  const pathname = usePathname();
  const client = useQueryClient();
  useEffect(() => {
    const page = firstReads[pathname];
    if (!page || page.role !== role) return;
    // A failed read is the screen's to show: it asks again and says so.
    page.prefetch(client);
  }, [client, pathname, role]);
}
