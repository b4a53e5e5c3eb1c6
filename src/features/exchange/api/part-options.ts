import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { PartDetailDto, PartListDto } from '@shared/schemas/part.ts';
import { api, toQuery } from '@/lib/api-client.ts';

/** Listed parts whose name or salvage source matches, for the listing form's part picker. */
export function usePartOptions(q: string) {
  const p = { q: q.trim() || undefined, pageSize: 12, sort: 'name' as const };
  return useQuery(
    queryOptions({
      queryKey: ['parts', 'list', p] as const,
      queryFn: () => api.get<PartListDto>(`/api/parts${toQuery(p)}`),
      placeholderData: keepPreviousData,
      staleTime: 60_000,
    }),
  );
}

/** The picked part's name, when a form starts from a part id (?partId= or an existing listing). */
export function usePickedPart(id: number | undefined) {
  return useQuery({
    queryKey: ['parts', 'detail', id ?? 0] as const,
    queryFn: () => api.get<PartDetailDto>(`/api/parts/${id}`),
    enabled: id !== undefined,
    staleTime: 60_000,
  });
}
