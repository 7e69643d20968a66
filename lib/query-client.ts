import { QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-client';

/** Only a lost connection or a server error may fix itself: retry those twice, nothing else. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status !== 0 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000, refetchOnWindowFocus: true },
      mutations: { retry: false },
    },
  });
}

export const queryClient = createQueryClient();
