import { use, useEffect } from 'react';
import { usePathname } from 'expo-router';
import { ServerDataLoaderContext } from 'expo-router/build/loaders/ServerDataLoaderContext';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { MusicianHomeSchema } from '@/shared/schemas/musician';
import { MeSchema, type Role } from '@/shared/schemas/role';
import { TodaySchema } from '@/shared/schemas/today';
import { firstReadsOf, type FirstRead, type FirstReads } from '@/shared/web/first-reads';
import { meQuery } from './use-me';
import { musicianHomeQuery } from './use-musician-home';
import { todayQuery } from './use-today';

// Each first read (shared/web/first-reads.ts) as the app's query: its cache entry and the schema its
// answer is checked against, whether it came from the API or inside the page.
const queries = {
  '/api/me': { options: meQuery, schema: MeSchema },
  '/api/today': { options: todayQuery, schema: TodaySchema },
  '/api/me/musician': { options: musicianHomeQuery, schema: MusicianHomeSchema },
} satisfies Record<FirstRead, { options: { queryKey: readonly unknown[] }; schema: z.ZodType }>;

declare global {
  // Where expo-router's server rendering leaves the data it was given for the page (server/middleware/web-export.ts).
  var __EXPO_ROUTER_LOADER_DATA__: Record<string, unknown> | undefined;
}

// Expo Router keeps the data under the page's path; a page carries one set.
function firstReadsIn(served: Record<string, unknown> | null | undefined): FirstReads | undefined {
  const reads = served ? Object.values(served)[0] : undefined;
  return reads !== null && typeof reads === 'object' ? (reads as FirstReads) : undefined;
}

/** While the server draws a page: the reads it answered for it, from the render's context. */
export function useServedReads(): FirstReads | undefined {
  return firstReadsIn(use(ServerDataLoaderContext));
}

/** In the browser: the reads the page arrived with. */
export function readsInPage(): FirstReads | undefined {
  return typeof window === 'undefined' ? undefined : firstReadsIn(globalThis.__EXPO_ROUTER_LOADER_DATA__);
}

/**
 * Puts the served reads in the query cache, each checked by its schema as an API answer is; one that does
 * not pass is left out, and the screen asks the API for it as usual.
 */
export function seedFirstReads(client: QueryClient, reads: FirstReads | undefined): void {
  for (const [read, { options, schema }] of Object.entries(queries)) {
    const answer = reads?.[read as FirstRead];
    if (answer === undefined) continue;
    const checked = schema.safeParse(answer);
    if (checked.success) client.setQueryData(options.queryKey, checked.data);
  }
}

/**
 * Starts a page's first reads as soon as the account is known, not once the signed-in screens' chunk has
 * arrived and run (after a navigation inside the app; a page the server drew has them already, and a
 * read still fresh in the cache is not asked again). With the answers in, the screen draws once, with
 * its data, in a render React can pause for input.
 */
export function useFirstReads(role: Role | undefined): void {
  const pathname = usePathname();
  const client = useQueryClient();
  useEffect(() => {
    if (!role) return;
    // A failed read is the screen's to show: it asks again and says so.
    for (const read of firstReadsOf(pathname, role)) {
      if (read !== '/api/me') void client.prefetchQuery(queries[read].options as typeof todayQuery);
    }
  }, [client, pathname, role]);
}
