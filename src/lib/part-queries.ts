import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { GainHistogramDto, ListPartsQuery, PartDetailDto, PartListDto } from '@shared/schemas/part.ts';
import { api, toQuery } from '@/lib/api-client.ts';

/**
 * The one query-key tree for parts, used by the registry, the build editor's part picker and the exchange:
 * proposals and listings invalidate `partQueries.all` or a detail.
 */
export const partQueries = {
  all: ['parts'] as const,
  list: (p: Partial<ListPartsQuery>) =>
    queryOptions({
      queryKey: ['parts', 'list', p] as const,
      queryFn: ({ signal }) => api.get<PartListDto>(`/api/parts${toQuery(p)}`, { signal }),
      placeholderData: keepPreviousData,
    }),
  histogram: () =>
    queryOptions({
      queryKey: ['parts', 'histogram'] as const,
      queryFn: ({ signal }) => api.get<GainHistogramDto>('/api/parts/histogram', { signal }),
      staleTime: 5 * 60_000,
    }),
  detail: (id: number) =>
    queryOptions({
      queryKey: ['parts', 'detail', id] as const,
      queryFn: ({ signal }) => api.get<PartDetailDto>(`/api/parts/${id}`, { signal }),
    }),
};

/** Address of a download of the whole current search (all pages) as CSV or JSON; the server names the file. */
export function partsExportHref(p: Partial<ListPartsQuery>, format: 'csv' | 'json'): string {
  const { page: _page, pageSize: _pageSize, ...search } = p;
  return `/api/parts${toQuery({ ...search, format })}`;
}
