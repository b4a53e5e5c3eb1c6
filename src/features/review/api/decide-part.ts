import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AcceptRejectInput } from '@shared/schemas/review.ts';
import { api } from '@/lib/api-client.ts';
import { reviewKeys } from './get-review-queue.ts';

/** Accept a proposed part into the parts registry, or reject it. The desk reloads afterwards, also after a refusal (someone may have decided first). */
export function useDecidePart() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...input }: AcceptRejectInput & { id: number }) =>
      api.post<{ id: number; status: 'accepted' | 'rejected' }>(`/api/review/parts/${id}/decision`, input),
    onSettled: () => void qc.invalidateQueries({ queryKey: reviewKeys.all }),
  });
}
