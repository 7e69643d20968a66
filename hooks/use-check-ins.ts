import { useEffect, useSyncExternalStore } from 'react';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, isApiError } from '@/lib/api-client';
import { createCheckInQueue, type CheckInQueue } from '@/lib/check-in-queue';
import { deviceStore } from '@/lib/local-store';
import { CheckInSchema } from '@/shared/schemas/check-in';
import { CheckInResultSchema } from '@/shared/schemas/today';
import { musicianHomeKeys } from './use-musician-home';
import { myPlanKeys } from './use-my-plan';
import { todayKeys } from './use-today';

export const checkInKeys = {
  all: ['check-ins'] as const,
  list: () => [...checkInKeys.all, 'list'] as const,
};

/** The musician's own check-ins, newest first. */
export function useCheckInsQuery() {
  return useQuery({
    queryKey: checkInKeys.list(),
    queryFn: ({ signal }) => api('/api/check-ins', { schema: z.array(CheckInSchema), signal }),
  });
}

/** Lost connection, a server error or an expired sign-in may pass: keep the check-in and retry. */
function retryable(error: unknown): boolean {
  if (!isApiError(error)) return true;
  return error.status === 0 || error.status === 401 || error.status === 408 || error.status === 429 || error.status >= 500;
}

let shared: CheckInQueue | null = null;

function checkInQueue(): CheckInQueue {
  shared ??= createCheckInQueue({
    store: deviceStore(),
    retryable,
    send: (upload) => api('/api/check-ins', { method: 'POST', body: upload, schema: CheckInResultSchema }),
  });
  return shared;
}

/**
 * Sends check-ins through the device's queue (they survive a lost connection and a reload) and
 * refreshes today, the plan and the history when the server has one.
 */
export function useCheckInQueue() {
  const client = useQueryClient();
  const queue = checkInQueue();
  useSyncExternalStore(queue.subscribe, queue.version, queue.version);
  useEffect(() => {
    const off = queue.onSaved(() => {
      for (const key of [todayKeys.all, checkInKeys.all, myPlanKeys.all, musicianHomeKeys.all]) {
        void client.invalidateQueries({ queryKey: key });
      }
    });
    void queue.flush();
    const online = () => void queue.flush();
    const target = typeof window !== 'undefined' && typeof window.addEventListener === 'function' ? window : null;
    target?.addEventListener('online', online);
    return () => {
      off();
      target?.removeEventListener('online', online);
    };
  }, [client, queue]);
  return { submit: queue.enqueue, outcome: queue.outcome, pendingCount: queue.pendingCount() };
}
