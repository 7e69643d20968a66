import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { MyPlanSchema } from '@/shared/schemas/my-plan';

export const myPlanKeys = {
  all: ['my-plan'] as const,
  current: () => [...myPlanKeys.all, 'current'] as const,
};

/** The signed-in musician's plan: stages to the event, the next unlock, repertoire and setup. */
export function useMyPlanQuery() {
  return useQuery({
    queryKey: myPlanKeys.current(),
    queryFn: ({ signal }) => api('/api/plan', { schema: MyPlanSchema, signal }),
  });
}
