import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { LoadSummarySchema, PlayingChartSchema } from '@/shared/schemas/chart';
import {
  CheckInRowSchema,
  ClinicalNoteSchema,
  MusicianProfileSchema,
  type CreateClinicalNote,
  type UpdateMusicianProfile,
} from '@/shared/schemas/record';
import { musicianKeys } from './use-musicians';

export const recordKeys = {
  all: (id: string) => ['record', id] as const,
  profile: (id: string) => [...recordKeys.all(id), 'profile'] as const,
  notes: (id: string) => [...recordKeys.all(id), 'notes'] as const,
  checkIns: (id: string) => [...recordKeys.all(id), 'check-ins'] as const,
  chart: (id: string) => [...recordKeys.all(id), 'chart'] as const,
  load: (id: string) => [...recordKeys.all(id), 'load'] as const,
};

const base = (id: string) => `/api/musicians/${encodeURIComponent(id)}`;

export function useProfileQuery(id: string) {
  return useQuery({ queryKey: recordKeys.profile(id), queryFn: ({ signal }) => api(`${base(id)}/profile`, { schema: MusicianProfileSchema, signal }) });
}

export function useUpdateProfileMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateMusicianProfile) => api(`${base(id)}/profile`, { method: 'PATCH', body, schema: MusicianProfileSchema }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: recordKeys.profile(id) });
      void queryClient.invalidateQueries({ queryKey: musicianKeys.all });
    },
  });
}

export function useNotesQuery(id: string) {
  return useQuery({ queryKey: recordKeys.notes(id), queryFn: ({ signal }) => api(`${base(id)}/notes`, { schema: z.array(ClinicalNoteSchema), signal }) });
}

export function useAddNoteMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateClinicalNote) => api(`${base(id)}/notes`, { method: 'POST', body, schema: ClinicalNoteSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: recordKeys.notes(id) }),
  });
}

export function useCheckInRowsQuery(id: string) {
  return useQuery({ queryKey: recordKeys.checkIns(id), queryFn: ({ signal }) => api(`${base(id)}/check-ins`, { schema: z.array(CheckInRowSchema), signal }) });
}

/** 404 no_active_plan until a plan is active: screens show that as "no plan yet", not as an error. */
export function useChartQuery(id: string) {
  return useQuery({ queryKey: recordKeys.chart(id), queryFn: ({ signal }) => api(`${base(id)}/chart`, { schema: PlayingChartSchema, signal }) });
}

export function useLoadQuery(id: string) {
  return useQuery({ queryKey: recordKeys.load(id), queryFn: ({ signal }) => api(`${base(id)}/load`, { schema: LoadSummarySchema, signal }) });
}
