import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BuildDto } from '@shared/schemas/build.ts';
import { api } from '@/lib/api-client.ts';
import { reviewKeys } from './get-review-queue.ts';

/** The whole build (write-up, photos, actuators) for the desk's side panel. */
export const reviewBuildQuery = (id: number) =>
  queryOptions({
    queryKey: [...reviewKeys.all, 'build', id] as const,
    queryFn: ({ signal }) => api.get<BuildDto>(`/api/builds/${id}`, { signal }),
  });

export const useReviewBuild = (id: number) => useQuery(reviewBuildQuery(id));
