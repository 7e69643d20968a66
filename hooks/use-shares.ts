import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { ShareSchema, type CreateShare } from '@/shared/schemas/share';

export const shareKeys = {
  all: ['shares'] as const,
  mine: () => [...shareKeys.all, 'mine'] as const,
  ofMusician: (musicianId: string) => [...shareKeys.all, 'musician', musicianId] as const,
};

const SharesSchema = z.array(ShareSchema);
const NoContentSchema = z.null();

/** Who the signed-in musician shares their clearance with, and open invitations. */
export function useSharesQuery() {
  return useQuery({
    queryKey: shareKeys.mine(),
    queryFn: ({ signal }) => api('/api/shares', { schema: SharesSchema, signal }),
  });
}

/** For a clinician: who one of their musicians shares with (read only). */
export function useMusicianSharesQuery(musicianId: string) {
  return useQuery({
    queryKey: shareKeys.ofMusician(musicianId),
    queryFn: ({ signal }) =>
      api(`/api/musicians/${encodeURIComponent(musicianId)}/shares`, { schema: SharesSchema, signal }),
    enabled: musicianId.length > 0,
  });
}

export function useCreateShareMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateShare) => api('/api/shares', { method: 'POST', body: input, schema: SharesSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareKeys.mine() }),
  });
}

export function useStopSharingMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (teacherId: string) =>
      api(`/api/shares/teachers/${encodeURIComponent(teacherId)}`, { method: 'DELETE', schema: NoContentSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareKeys.mine() }),
  });
}

export function useWithdrawInvitationMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (email: string) =>
      api(`/api/shares/invitations/${encodeURIComponent(email)}`, { method: 'DELETE', schema: NoContentSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareKeys.mine() }),
  });
}
