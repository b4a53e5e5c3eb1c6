import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RunDto } from '@shared/schemas/run.ts';
import { api } from '@/lib/api-client.ts';
import { reviewKeys } from './get-review-queue.ts';

/** One calibration run, to find the build it belongs to (reports and the audit trail name runs by id only). */
export const reviewRunQuery = (id: number) =>
  queryOptions({
    queryKey: [...reviewKeys.all, 'run', id] as const,
    queryFn: ({ signal }) => api.get<RunDto>(`/api/runs/${id}`, { signal }),
    staleTime: 5 * 60_000,
  });

export const useReviewRun = (id: number, enabled = true) => useQuery({ ...reviewRunQuery(id), enabled });
