import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReviewQueueDto } from '@shared/schemas/review.ts';
import { api } from '@/lib/api-client.ts';

/** One key tree for the review desk; every decision invalidates `reviewKeys.all`. */
export const reviewKeys = {
  all: ['review'] as const,
  queue: ['review', 'queue'] as const,
};

export const reviewQueueQuery = queryOptions({
  queryKey: reviewKeys.queue,
  queryFn: ({ signal }) => api.get<ReviewQueueDto>('/api/review/queue', { signal }),
  staleTime: 15_000,
});

/** Everything waiting for a moderator, oldest first; only asked for when the viewer may open the desk. */
export const useReviewQueue = (enabled: boolean) => useQuery({ ...reviewQueueQuery, enabled });
