import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, ApiError } from '@/lib/api-client';
import { authClient } from '@/lib/auth-client';
import { MeSchema } from '@/shared/schemas/role';

export const meKeys = {
  all: ['me'] as const,
  current: () => [...meKeys.all, 'current'] as const,
};

async function fetchMe(signal: AbortSignal) {
  // better-auth answers a signed-out visitor with 200 and no session, so a plain visit to the
  // sign-in page does not fill the browser console with a failed /api/me request.
  const session = await authClient.getSession({ signal });
  if (!session) throw new ApiError(401, 'unauthenticated', 'Sign in to continue.');
  return api('/api/me', { schema: MeSchema, signal });
}

export const meQuery = queryOptions({ queryKey: meKeys.current(), queryFn: ({ signal }) => fetchMe(signal) });

/** The signed-in account; fails with ApiError 401 when nobody is signed in. */
export function useMeQuery() {
  return useQuery(meQuery);
}
