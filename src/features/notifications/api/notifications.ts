import { infiniteQueryOptions, queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { NotificationsDto, UnreadCountsDto } from '@shared/schemas/notification.ts';
import { api, toQuery } from '@/lib/api-client.ts';

/** One key tree: the list (paged by `before`) and the navigation's unread counts. */
export const notificationQueries = {
  all: ['notifications'] as const,
  list: () =>
    infiniteQueryOptions({
      queryKey: ['notifications', 'list'] as const,
      queryFn: ({ pageParam, signal }) =>
        api.get<NotificationsDto>(`/api/notifications${toQuery({ before: pageParam ?? undefined })}`, { signal }),
      initialPageParam: null as number | null,
      getNextPageParam: (last) => last.nextBefore,
    }),
  counts: () =>
    queryOptions({
      queryKey: ['notifications', 'counts'] as const,
      queryFn: ({ signal }) => api.get<UnreadCountsDto>('/api/notifications/counts', { signal }),
      refetchInterval: 60_000,
    }),
};

/** Mark the given notifications read, or all of them without ids. */
export function useMarkNotificationsRead() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (ids?: number[]) => api.post<{ unread: number }>('/api/notifications/read', ids ? { ids } : {}),
    onSuccess: () => qc.invalidateQueries({ queryKey: notificationQueries.all }),
  });
}
