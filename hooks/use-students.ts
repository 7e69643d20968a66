import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { StudentSchema } from '@/shared/schemas/musician';

export const studentKeys = {
  all: ['students'] as const,
  list: () => [...studentKeys.all, 'list'] as const,
};

/** The signed-in teacher's students (only those who shared with them). */
export function useStudentsQuery() {
  return useQuery({
    queryKey: studentKeys.list(),
    queryFn: ({ signal }) => api('/api/students', { schema: z.array(StudentSchema), signal }),
  });
}
