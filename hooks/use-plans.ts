import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, isApiError } from '@/lib/api-client';
import {
  ActivatedPlanSchema,
  OverrideResultSchema,
  PlanPresetsSchema,
  PlanStateSchema,
  PlanVersionDetailSchema,
  PlanVersionSchema,
  type OverrideRequest,
  type PlanSettingsBodyInput,
} from '@/shared/schemas/plan';
import { musicianKeys } from './use-musicians';
import { recordKeys } from './use-record';

export const planKeys = {
  presets: () => ['plan-presets'] as const,
  all: (id: string) => ['plans', id] as const,
  versions: (id: string) => [...planKeys.all(id), 'versions'] as const,
  version: (id: string, planId: string) => [...planKeys.all(id), 'version', planId] as const,
  state: (id: string) => [...planKeys.all(id), 'state'] as const,
};

const base = (id: string) => `/api/musicians/${encodeURIComponent(id)}`;

/** A plan change moves the caseload, the chart, the load and the clearance too. */
function useInvalidatePlan(id: string) {
  const queryClient = useQueryClient();
  return () => {
    void queryClient.invalidateQueries({ queryKey: planKeys.all(id) });
    void queryClient.invalidateQueries({ queryKey: recordKeys.all(id) });
    void queryClient.invalidateQueries({ queryKey: musicianKeys.all });
    void queryClient.invalidateQueries({ queryKey: ['pieces', id] });
  };
}

export function usePlanPresetsQuery() {
  return useQuery({ queryKey: planKeys.presets(), queryFn: ({ signal }) => api('/api/plan-presets', { schema: PlanPresetsSchema, signal }), staleTime: Infinity });
}

export function usePlanVersionsQuery(id: string) {
  return useQuery({ queryKey: planKeys.versions(id), queryFn: ({ signal }) => api(`${base(id)}/plans`, { schema: z.array(PlanVersionSchema), signal }) });
}

export function usePlanVersionQuery(id: string, planId: string | undefined) {
  return useQuery({
    queryKey: planKeys.version(id, planId ?? ''),
    queryFn: ({ signal }) => api(`${base(id)}/plans/${encodeURIComponent(planId ?? '')}`, { schema: PlanVersionDetailSchema, signal }),
    enabled: Boolean(planId),
  });
}

/** The active plan's state; null (not an error) while no version is active. */
export function usePlanStateQuery(id: string) {
  return useQuery({
    queryKey: planKeys.state(id),
    queryFn: async ({ signal }) => {
      try {
        return await api(`${base(id)}/plan`, { schema: PlanStateSchema, signal });
      } catch (error) {
        if (isApiError(error) && error.code === 'no_active_plan') return null;
        throw error;
      }
    },
  });
}

/** Saves the builder's settings: a new draft, or an edit (a draft in place; the active version becomes a new draft). */
export function useSavePlanMutation(id: string) {
  const invalidate = useInvalidatePlan(id);
  return useMutation({
    mutationFn: ({ planId, body }: { planId?: string; body: PlanSettingsBodyInput }) =>
      planId
        ? api(`${base(id)}/plans/${encodeURIComponent(planId)}`, { method: 'PATCH', body, schema: PlanVersionSchema })
        : api(`${base(id)}/plans`, { method: 'POST', body, schema: PlanVersionSchema }),
    onSuccess: invalidate,
  });
}

export function useActivatePlanMutation(id: string) {
  const invalidate = useInvalidatePlan(id);
  return useMutation({
    mutationFn: (planId: string) => api(`${base(id)}/plans/${encodeURIComponent(planId)}/activate`, { method: 'POST', body: {}, schema: ActivatedPlanSchema }),
    onSuccess: invalidate,
  });
}

export function useDeleteDraftMutation(id: string) {
  const invalidate = useInvalidatePlan(id);
  return useMutation({
    mutationFn: (planId: string) => api(`${base(id)}/plans/${encodeURIComponent(planId)}`, { method: 'DELETE', schema: z.null() }),
    onSuccess: invalidate,
  });
}

export function useOverrideMutation(id: string) {
  const invalidate = useInvalidatePlan(id);
  return useMutation({
    mutationFn: (body: OverrideRequest) => api(`${base(id)}/plan/overrides`, { method: 'POST', body, schema: OverrideResultSchema }),
    onSuccess: invalidate,
  });
}
