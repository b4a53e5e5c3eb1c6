import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { BuildDto, BuildListDto, ListBuildsQuery } from '@shared/schemas/build.ts';
import { api, toQuery } from '@/lib/api-client.ts';

/** One key tree for everything about builds; writes invalidate `buildQueries.all`. */
export const buildQueries = {
  all: ['builds'] as const,
  list: (p: Partial<ListBuildsQuery>) =>
    queryOptions({
      queryKey: ['builds', 'list', p] as const,
      queryFn: ({ signal }) => api.get<BuildListDto>(`/api/builds${toQuery(p)}`, { signal }),
      placeholderData: keepPreviousData,
    }),
  mine: () =>
    queryOptions({ queryKey: ['builds', 'mine'] as const, queryFn: ({ signal }) => api.get<BuildListDto>('/api/builds/mine', { signal }) }),
  detail: (id: number) =>
    queryOptions({
      queryKey: ['builds', 'detail', id] as const,
      queryFn: ({ signal }) => api.get<BuildDto>(`/api/builds/${id}`, { signal }),
    }),
};
