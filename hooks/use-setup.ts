import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { SetupItemSchema, type CreateSetupItem, type UpdateSetupItem } from '@/shared/schemas/setup';

export const setupKeys = { list: (id: string) => ['setup', id] as const };

const base = (id: string) => `/api/musicians/${encodeURIComponent(id)}/setup`;

export function useSetupQuery(id: string) {
  return useQuery({ queryKey: setupKeys.list(id), queryFn: ({ signal }) => api(base(id), { schema: z.array(SetupItemSchema), signal }) });
}

export function useAddSetupItemMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateSetupItem) => api(base(id), { method: 'POST', body, schema: SetupItemSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: setupKeys.list(id) }),
  });
}

export function useUpdateSetupItemMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ itemId, body }: { itemId: string; body: UpdateSetupItem }) =>
      api(`${base(id)}/${encodeURIComponent(itemId)}`, { method: 'PATCH', body, schema: SetupItemSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: setupKeys.list(id) }),
  });
}

export function useDeleteSetupItemMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (itemId: string) => api(`${base(id)}/${encodeURIComponent(itemId)}`, { method: 'DELETE', schema: z.null() }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: setupKeys.list(id) }),
  });
}
