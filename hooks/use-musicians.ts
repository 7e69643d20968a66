import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { CaseloadEntrySchema } from '@/shared/schemas/musician';

export const musicianKeys = {
  all: ['musicians'] as const,
  caseload: () => [...musicianKeys.all, 'caseload'] as const,
  detail: (id: string) => [...musicianKeys.all, 'detail', id] as const,
};

/** The signed-in clinician's caseload. */
export function useCaseloadQuery() {
  return useQuery({
    queryKey: musicianKeys.caseload(),
    queryFn: ({ signal }) => api('/api/musicians', { schema: z.array(CaseloadEntrySchema), signal }),
  });
}

export function useMusicianQuery(id: string) {
  return useQuery({
    queryKey: musicianKeys.detail(id),
    queryFn: ({ signal }) => api(`/api/musicians/${encodeURIComponent(id)}`, { schema: CaseloadEntrySchema, signal }),
  });
}
