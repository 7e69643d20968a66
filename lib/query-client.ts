import { QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-client';

/** Client errors (4xx) will not fix themselves: retry only network failures and server errors, twice. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
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
