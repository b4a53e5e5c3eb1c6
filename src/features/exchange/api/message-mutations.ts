import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SendMessageInput } from '@shared/schemas/listing.ts';
import { api } from '@/lib/api-client.ts';
import { inboxQueries } from './inbox-queries.ts';

type Sent = { threadId: number; messageId: number };

/** Write to a listing's owner through the site (201 with the conversation's id; 429 when sending too fast). */
export function useSendListingMessage(listingId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: SendMessageInput) => api.post<Sent>(`/api/listings/${listingId}/messages`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: inboxQueries.all }),
  });
}

/** Reply inside a conversation of the inbox. */
export function useReplyInThread(threadId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: SendMessageInput) => api.post<Sent>(`/api/inbox/${threadId}/messages`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: inboxQueries.all }),
  });
}

/** Mark a conversation's messages from the other party read (the thread page does so once it shows them). */
export function useMarkThreadRead(threadId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>(`/api/inbox/${threadId}/read`),
    onSuccess: () => qc.invalidateQueries({ queryKey: inboxQueries.all }),
  });
}
