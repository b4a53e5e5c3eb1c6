import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateReviewPostInput, ReviewThreadDto, ReviewThreadItemDto } from '@shared/schemas/review-thread.ts';
import { api } from './api-client.ts';

/** A build's review thread (its maker and the moderators), shared by the build page, the editor and the review desk. */
export const reviewThreadQuery = (buildId: number) =>
  queryOptions({
    queryKey: ['review-thread', buildId] as const,
    queryFn: ({ signal }) => api.get<ReviewThreadDto>(`/api/builds/${buildId}/review-thread`, { signal }),
  });

export function usePostToReviewThread(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateReviewPostInput) => api.post<ReviewThreadItemDto>(`/api/builds/${buildId}/review-thread`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: reviewThreadQuery(buildId).queryKey }),
  });
}
