import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { GivenUpMailListDto, QueuedMailDto } from '@shared/schemas/outbox.ts';
import { api } from '@/lib/api-client.ts';

export const givenUpMailQueries = {
  all: ['admin', 'outbox', 'given-up'] as const,
  list: () =>
    queryOptions({
      queryKey: givenUpMailQueries.all,
      queryFn: ({ signal }) => api.get<GivenUpMailListDto>('/api/admin/outbox/given-up', { signal }),
    }),
};

export const useGivenUpMails = () => useQuery(givenUpMailQueries.list());

/** Put a given-up mail back in the queue. */
export function useRequeueMail() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (mailId: number) => api.post<QueuedMailDto>(`/api/admin/outbox/${mailId}/requeue`),
    onSuccess: () => qc.invalidateQueries({ queryKey: givenUpMailQueries.all }),
  });
}
