import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { TodaySchema } from '@/shared/schemas/today';

export const todayKeys = {
  all: ['today'] as const,
  current: () => [...todayKeys.all, 'current'] as const,
};

/** Today's programme for the signed-in musician, from the plan as it now stands. */
export const todayQuery = queryOptions({
  queryKey: todayKeys.current(),
  queryFn: ({ signal }) => api('/api/today', { schema: TodaySchema, signal }),
});

export function useTodayQuery() {
  return useQuery(todayQuery);
}
