import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api, isApiError } from '@/lib/api-client';
import { DevMailSchema } from '@/shared/schemas/dev-mail';

export const devMailKeys = {
  all: ['dev-mail'] as const,
  list: () => [...devMailKeys.all, 'list'] as const,
  detail: (id: string) => [...devMailKeys.all, 'detail', id] as const,
};

/** The development mailbox answers 404 when a real SMTP server is configured: then there is no mailbox. */
export function isMailboxOff(error: unknown): boolean {
  return isApiError(error) && error.status === 404 && error.code === 'not_found';
}

export function useDevMailQuery({ enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({
    enabled,
    queryKey: devMailKeys.list(),
    queryFn: ({ signal }) => api('/api/admin/mail', { schema: z.array(DevMailSchema), signal }),
    refetchInterval: 10_000,
  });
}

export function useDevMailMessageQuery(id: string) {
  return useQuery({
    queryKey: devMailKeys.detail(id),
    queryFn: ({ signal }) => api(`/api/admin/mail/${encodeURIComponent(id)}`, { schema: DevMailSchema, signal }),
  });
}
