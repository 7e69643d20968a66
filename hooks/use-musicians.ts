import { useMutation, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { CaseloadEntrySchema, type CaseloadQuery } from '@/shared/schemas/musician';
import { SummarySentSchema } from '@/shared/schemas/summary';

export type CaseloadFilter = Pick<CaseloadQuery, 'status' | 'alerts'>;

export const musicianKeys = {
  all: ['musicians'] as const,
  caseload: () => [...musicianKeys.all, 'caseload'] as const,
  caseloadWith: (query: Partial<CaseloadQuery>) => [...musicianKeys.caseload(), query] as const,
  detail: (id: string) => [...musicianKeys.all, 'detail', id] as const,
};

function caseloadSearch(query: Partial<CaseloadQuery>): string {
  const params = new URLSearchParams();
  if (query.sort) params.set('sort', query.sort);
  if (query.status) params.set('status', query.status);
  if (query.alerts) params.set('alerts', query.alerts);
  const text = params.toString();
  return text ? `?${text}` : '';
}

/** The signed-in clinician's caseload, sorted and filtered by the server (query params of the API). */
export function useCaseloadQuery(query: Partial<CaseloadQuery> = {}) {
  return useQuery({
    queryKey: musicianKeys.caseloadWith(query),
    queryFn: ({ signal }) => api(`/api/musicians${caseloadSearch(query)}`, { schema: z.array(CaseloadEntrySchema), signal }),
  });
}

export function useMusicianQuery(id: string) {
  return useQuery({
    queryKey: musicianKeys.detail(id),
    queryFn: ({ signal }) => api(`/api/musicians/${encodeURIComponent(id)}`, { schema: CaseloadEntrySchema, signal }),
  });
}

/** Sends this week's caseload summary e-mail at once (the schedule sends it weekly anyway). */
export function useSendSummaryMutation() {
  return useMutation({
    mutationFn: () => api('/api/summary/send-now', { method: 'POST', body: {}, schema: SummarySentSchema }),
  });
}
