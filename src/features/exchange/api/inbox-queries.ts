import { queryOptions } from '@tanstack/react-query';
import type { ThreadDto, ThreadSummaryDto } from '@shared/schemas/listing.ts';
import { api } from '@/lib/api-client.ts';

/** The signed-in maker's conversations; opening one marks it read, so it refetches the list too. */
export const inboxQueries = {
  all: ['inbox'] as const,
  threads: () =>
    queryOptions({
      queryKey: ['inbox', 'threads'] as const,
      queryFn: async ({ signal }) => (await api.get<{ threads: ThreadSummaryDto[] }>('/api/inbox', { signal })).threads,
      staleTime: 10_000,
    }),
  thread: (id: number) =>
    queryOptions({
      queryKey: ['inbox', 'thread', id] as const,
      queryFn: ({ signal }) => api.get<ThreadDto>(`/api/inbox/${id}`, { signal }),
      staleTime: 0,
    }),
};
