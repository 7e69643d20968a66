import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { MusicianHomeSchema } from '@/shared/schemas/musician';

export const musicianHomeKeys = {
  all: ['musician-home'] as const,
  current: () => [...musicianHomeKeys.all, 'current'] as const,
};

/** The signed-in musician's own summary: instrument, clinician and plan (null until prescribed). */
export const musicianHomeQuery = queryOptions({
  queryKey: musicianHomeKeys.current(),
  queryFn: ({ signal }) => api('/api/me/musician', { schema: MusicianHomeSchema, signal }),
});

export function useMusicianHomeQuery() {
  return useQuery(musicianHomeQuery);
}
