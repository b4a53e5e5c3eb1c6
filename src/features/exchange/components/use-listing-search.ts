import { useSearchParams } from 'react-router-dom';
import { listListingsQuery, type ListListingsQuery } from '@shared/schemas/listing.ts';
import { type ListingCondition, type ListingKind } from '@shared/schemas/listing-vocabulary.ts';
import type { PartCategory } from '@shared/schemas/part-vocabulary.ts';
import { readSearch, writeSearch } from '@/lib/url-search.ts';
import { paths } from '@/config/paths.ts';

/** Cards per page of the exchange. */
export const LISTINGS_PAGE_SIZE = 12;

/** The exchange's filters as the URL holds them. */
export interface ListingFilters {
  q: string;
  kind: ListingKind | undefined;
  category: PartCategory | undefined;
  condition: ListingCondition | undefined;
  region: string;
  freeOnly: boolean;
}

const toSearch = (f: ListingFilters, page = 1) => writeSearch({ ...f, page }, { page: 1 });

/**
 * The exchange's filters and page live in the URL (?q=&kind=&category=&condition=&region=&freeOnly=&page=),
 * read with the API's own query schema; odd values are ignored.
 */
export function useListingSearch() {
  const [params, setParams] = useSearchParams();
  const read = readSearch(listListingsQuery, params, ['pageSize', 'partId']);
  const filters: ListingFilters = {
    q: read.q ?? '',
    kind: read.kind,
    category: read.category,
    condition: read.condition,
    region: read.region ?? '',
    freeOnly: read.freeOnly === true,
  };
  const page = read.page ?? 1;
  const query: Partial<ListListingsQuery> = {
    q: filters.q || undefined,
    kind: filters.kind,
    category: filters.category,
    condition: filters.condition,
    region: filters.region || undefined,
    freeOnly: filters.freeOnly || undefined,
    page,
    pageSize: LISTINGS_PAGE_SIZE,
  };
  const filtered = Boolean(filters.q || filters.kind || filters.category || filters.condition || filters.region || filters.freeOnly);
  return {
    filters,
    page,
    query,
    filtered,
    key: params.toString(),
    hrefFor: (p: number) => `${paths.exchange}${toSearch(filters, p)}`,
    clearHref: paths.exchange,
    setFilters: (next: Partial<ListingFilters>) => setParams(toSearch({ ...filters, ...next })),
  };
}

/** What `useListingSearch()` returns. */
export type ListingSearch = ReturnType<typeof useListingSearch>;
