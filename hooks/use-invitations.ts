import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import {
  InvitationPreviewSchema,
  InvitationSchema,
  type AcceptInvitation,
  type CreateInvitation,
} from '@/shared/schemas/invitation';
import { RoleSchema } from '@/shared/schemas/role';
import { musicianKeys } from './use-musicians';

export const invitationKeys = {
  all: ['invitations'] as const,
  sent: () => [...invitationKeys.all, 'sent'] as const,
  preview: (token: string) => [...invitationKeys.all, 'preview', token] as const,
};

const CreatedInvitationSchema = InvitationSchema.extend({
  musicianId: z.string().nullable(),
  emailSent: z.boolean(),
});

const AcceptedSchema = z.object({ email: z.string(), role: RoleSchema });

/** Invitations the signed-in clinician has sent. */
export function useSentInvitationsQuery() {
  return useQuery({
    queryKey: invitationKeys.sent(),
    queryFn: ({ signal }) => api('/api/invitations', { schema: z.array(InvitationSchema), signal }),
  });
}

export function useCreateInvitationMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateInvitation) =>
      api('/api/invitations', { method: 'POST', body: input, schema: CreatedInvitationSchema }),
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: invitationKeys.sent() }),
        queryClient.invalidateQueries({ queryKey: musicianKeys.all }),
      ]);
    },
  });
}

/** Public: who invited this person, read from the link's token. */
export function useInvitationPreviewQuery(token: string) {
  return useQuery({
    queryKey: invitationKeys.preview(token),
    queryFn: ({ signal }) =>
      api(`/api/invitations/by-token/${encodeURIComponent(token)}`, { schema: InvitationPreviewSchema, signal }),
    enabled: token.length > 0,
  });
}

export function useAcceptInvitationMutation(token: string) {
  return useMutation({
    mutationFn: (input: AcceptInvitation) =>
      api(`/api/invitations/by-token/${encodeURIComponent(token)}/accept`, {
        method: 'POST',
        body: input,
        schema: AcceptedSchema,
      }),
  });
}
