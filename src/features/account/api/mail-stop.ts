import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { UnsubscribeStateDto } from '@shared/schemas/mail-choices.ts';
import { api } from '@/lib/api-client.ts';

/** The signed unsubscribe link from a mail's footer: what it stops (GET) and stopping it (POST). */
export const mailStopQuery = (tail: string) =>
  queryOptions({
    queryKey: ['mail-stop', tail] as const,
    queryFn: ({ signal }) => api.get<UnsubscribeStateDto>(`/api/mail/unsubscribe/${tail}`, { signal }),
    retry: false,
  });

export function useMailStop(tail: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<UnsubscribeStateDto>(`/api/mail/unsubscribe/${tail}`),
    onSuccess: (data) => qc.setQueryData(mailStopQuery(tail).queryKey, data),
  });
}
