import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReviewBuildRunsDto } from '@shared/schemas/review-desk.ts';
import { api } from '@/lib/api-client.ts';
import { reviewKeys } from './get-review-queue.ts';

/** A build's pending runs with their flags, and what "publish with runs" would do with them. */
const reviewBuildRunsQuery = (buildId: number) =>
  queryOptions({
    queryKey: [...reviewKeys.all, 'build', buildId, 'runs'] as const,
    queryFn: ({ signal }) => api.get<ReviewBuildRunsDto>(`/api/review/builds/${buildId}/runs`, { signal }),
  });

export const useReviewBuildRuns = (buildId: number) => useQuery(reviewBuildRunsQuery(buildId));
