import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { ListingDto, ListingListDto, ListListingsQuery } from '@shared/schemas/listing.ts';
import { api, toQuery } from '@/lib/api-client.ts';

/** One key tree for exchange listings; every write invalidates `listingQueries.all`. */
export const listingQueries = {
  all: ['listings'] as const,
  list: (p: Partial<ListListingsQuery>) =>
    queryOptions({
      queryKey: ['listings', 'list', p] as const,
      queryFn: ({ signal }) => api.get<ListingListDto>(`/api/listings${toQuery(p)}`, { signal }),
      placeholderData: keepPreviousData,
    }),
  mine: () =>
    queryOptions({
      queryKey: ['listings', 'mine'] as const,
      queryFn: ({ signal }) => api.get<ListingListDto>('/api/listings/mine', { signal }),
    }),
  detail: (id: number) =>
    queryOptions({
      queryKey: ['listings', 'detail', id] as const,
      queryFn: ({ signal }) => api.get<ListingDto>(`/api/listings/${id}`, { signal }),
    }),
};
