import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ListPartsQuery, PartListDto } from '@shared/schemas/part.ts';
import { api, toQuery } from '@/lib/api-client.ts';

/** Listed parts for the actuator's part picker, by name or salvage source and category. */
export const partSearchQuery = (p: Partial<ListPartsQuery>) =>
  queryOptions({
    queryKey: ['parts', 'list', p] as const,
    queryFn: () => api.get<PartListDto>(`/api/parts${toQuery(p)}`),
    placeholderData: keepPreviousData,
    staleTime: 60_000,
  });

/** The picker's search: up to 10 listed parts matching the text. */
export const usePartSearch = (q: string, category?: ListPartsQuery['category']) =>
  useQuery(partSearchQuery({ q: q.trim() || undefined, category, pageSize: 10 }));
