import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { AuditEntrySchema } from '@/shared/schemas/audit';

export const auditKeys = {
  all: ['audit'] as const,
  full: () => [...auditKeys.all, 'full'] as const,
  musician: (musicianId: string) => [...auditKeys.all, 'musician', musicianId] as const,
};

/** Every record's trail (admin). */
export function useFullAuditQuery() {
  return useQuery({
    queryKey: auditKeys.full(),
    queryFn: ({ signal }) => api('/api/admin/audit', { schema: z.array(AuditEntrySchema), signal }),
  });
}

/** One musician's trail (their clinician). */
export function useMusicianAuditQuery(musicianId: string) {
  return useQuery({
    queryKey: auditKeys.musician(musicianId),
    queryFn: ({ signal }) => api(`/api/musicians/${encodeURIComponent(musicianId)}/audit`, { schema: z.array(AuditEntrySchema), signal }),
  });
}
