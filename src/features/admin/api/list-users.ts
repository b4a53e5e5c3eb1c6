import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AdminUserListDto, ListUsersQuery } from '@shared/schemas/user.ts';
import { api, toQuery } from '@/lib/api-client.ts';

export const adminUserQueries = {
  all: ['admin', 'users'] as const,
  list: (p: Partial<ListUsersQuery>) =>
    queryOptions({
      queryKey: [...adminUserQueries.all, p],
      queryFn: ({ signal }) => api.get<AdminUserListDto>(`/api/admin/users${toQuery(p)}`, { signal }),
      placeholderData: keepPreviousData,
    }),
};

export const useAdminUsers = (p: Partial<ListUsersQuery>) => useQuery(adminUserQueries.list(p));
