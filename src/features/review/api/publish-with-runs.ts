import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PublishWithRunsInput, PublishWithRunsResultDto } from '@shared/schemas/review-desk.ts';
import { api } from '@/lib/api-client.ts';
import { reviewKeys } from './get-review-queue.ts';

/** Publish a build and accept the runs the preview listed. The desk reloads afterwards, also after a refusal. */
export function usePublishWithRuns() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ buildId, ...input }: PublishWithRunsInput & { buildId: number }) =>
      api.post<PublishWithRunsResultDto>(`/api/review/builds/${buildId}/publish-with-runs`, input),
    onSettled: () => {
      void qc.invalidateQueries({ queryKey: reviewKeys.all });
      void qc.invalidateQueries({ queryKey: ['builds'] });
    },
  });
}
