import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api, apiBaseUrl } from '@/lib/api-client';
import { StudentClearanceSchema, StudentSummarySchema } from '@/shared/schemas/clearance';

export const studentKeys = {
  all: ['students'] as const,
  list: () => [...studentKeys.all, 'list'] as const,
  clearance: (id: string) => [...studentKeys.all, 'clearance', id] as const,
};

/** The signed-in teacher's students (only those who shared with them). */
export function useStudentsQuery() {
  return useQuery({
    queryKey: studentKeys.list(),
    queryFn: ({ signal }) => api('/api/students', { schema: z.array(StudentSummarySchema), signal }),
  });
}

/** What one student may play now, and when more is expected; a 404 once they stop sharing. */
export function useStudentClearanceQuery(id: string) {
  return useQuery({
    queryKey: studentKeys.clearance(id),
    queryFn: ({ signal }) =>
      api(`/api/students/${encodeURIComponent(id)}`, { schema: StudentClearanceSchema, signal }),
    enabled: id.length > 0,
  });
}

/** The dated, printable clearance note: an HTML page the browser opens and prints. */
export function studentPrintUrl(id: string): string {
  return `${apiBaseUrl()}/api/students/${encodeURIComponent(id)}/print`;
}
