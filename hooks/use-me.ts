import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { MeSchema } from '@/shared/schemas/role';

export const meKeys = {
  all: ['me'] as const,
  current: () => [...meKeys.all, 'current'] as const,
};

/** The signed-in account; fails with ApiError 401 when nobody is signed in. */
export function useMeQuery() {
  return useQuery({
    queryKey: meKeys.current(),
    queryFn: ({ signal }) => api('/api/me', { schema: MeSchema, signal }),
  });
}
