import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReportDecisionInput } from '@shared/schemas/review.ts';
import { api } from '@/lib/api-client.ts';
import { reviewKeys } from './get-review-queue.ts';

/** Resolve or dismiss an open report, saying what was done. The desk reloads afterwards, also after a refusal (someone may have decided first). */
export function useDecideReport() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...input }: ReportDecisionInput & { id: number }) =>
      api.post<{ id: number; status: 'resolved' | 'dismissed' }>(`/api/review/reports/${id}/decision`, input),
    onSettled: () => void qc.invalidateQueries({ queryKey: reviewKeys.all }),
  });
}
