import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { UserSummarySchema } from '@/shared/schemas/user';

export const adminUserKeys = {
  all: ['admin-users'] as const,
  list: () => [...adminUserKeys.all, 'list'] as const,
};

export function useAdminUsersQuery() {
  return useQuery({
    queryKey: adminUserKeys.list(),
    queryFn: ({ signal }) => api('/api/admin/users', { schema: z.array(UserSummarySchema), signal }),
  });
}
