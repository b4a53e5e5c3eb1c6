import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { RUN_POINTS_PAGE_SIZE, type RunPointsPageDto } from '@shared/schemas/review-desk.ts';
import { api, toQuery } from '@/lib/api-client.ts';
import { reviewKeys } from './get-review-queue.ts';

/** One page of a run's raw record, as recorded. */
const runPointsQuery = (runId: number, page: number) =>
  queryOptions({
    queryKey: [...reviewKeys.all, 'run', runId, 'points', page] as const,
    queryFn: ({ signal }) =>
      api.get<RunPointsPageDto>(`/api/review/runs/${runId}/points${toQuery({ page, pageSize: RUN_POINTS_PAGE_SIZE })}`, { signal }),
    placeholderData: keepPreviousData,
    staleTime: 5 * 60_000,
  });

export const useRunPoints = (runId: number, page: number) => useQuery(runPointsQuery(runId, page));
