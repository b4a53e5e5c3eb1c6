import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReviewHistoryDto } from '@shared/schemas/review-desk.ts';
import { api } from '@/lib/api-client.ts';
import { reviewKeys } from './get-review-queue.ts';

/** A build's earlier decisions and notes, and what changed since its last review. */
const reviewHistoryQuery = (buildId: number) =>
  queryOptions({
    queryKey: [...reviewKeys.all, 'build', buildId, 'history'] as const,
    queryFn: ({ signal }) => api.get<ReviewHistoryDto>(`/api/review/builds/${buildId}/history`, { signal }),
  });

export const useReviewHistory = (buildId: number) => useQuery(reviewHistoryQuery(buildId));
