import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BuildDecisionInput } from '@shared/schemas/review.ts';
import type { BuildStatus } from '@shared/schemas/build-vocabulary.ts';
import { api } from '@/lib/api-client.ts';
import { reviewKeys } from './get-review-queue.ts';

/** Publish, return with notes or decline a build. The desk reloads afterwards, also after a refusal (someone may have decided first). */
export function useDecideBuild() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...input }: BuildDecisionInput & { id: number }) =>
      api.post<{ id: number; status: BuildStatus }>(`/api/review/builds/${id}/decision`, input),
    onSettled: () => {
      void qc.invalidateQueries({ queryKey: reviewKeys.all });
      void qc.invalidateQueries({ queryKey: ['builds'] });
    },
  });
}
