import { useSearchParams } from 'react-router-dom';
import { listPartsQuery, type ListPartsQuery, type PartCategory, type PartSort } from '@shared/schemas/part.ts';
import { readSearch, writeSearch } from '@/lib/url-search.ts';
import { paths } from '@/config/paths.ts';

/** Rows per page of the registry table. */
export const PARTS_PAGE_SIZE = 25;

/** The registry's filters as the URL holds them (numbers undefined when unset). */
export interface PartFilters {
  q: string;
  category: PartCategory | undefined;
  gainMin: number | undefined;
  gainMax: number | undefined;
  minRuns: number | undefined;
  maxVolts: number | undefined;
}

const toSearch = (f: PartFilters, sort: PartSort, page: number) => writeSearch({ ...f, sort, page }, { sort: 'name', page: 1 });

/**
 * Filters, sort and page of the registry live in the URL (?q=&category=&gainMin=&gainMax=&minRuns=&maxVolts=&sort=&page=),
 * so a search can be shared; they are read with the API's own query schema, field by field, and odd values
 * fall back to "no filter". A reversed gain range is swapped.
 */
export function usePartSearch() {
  const [params, setParams] = useSearchParams();
  const read = readSearch(listPartsQuery, params, ['pageSize', 'format']);
  let { gainMin, gainMax } = read;
  if (gainMin !== undefined && gainMax !== undefined && gainMin > gainMax) [gainMin, gainMax] = [gainMax, gainMin];
  const filters: PartFilters = {
    q: read.q ?? '',
    category: read.category,
    gainMin,
    gainMax,
    minRuns: read.minRuns,
    maxVolts: read.maxVolts,
  };
  const sort: PartSort = read.sort ?? 'name';
  const page = read.page ?? 1;
  const query: Partial<ListPartsQuery> = {
    q: filters.q || undefined,
    category: filters.category,
    gainMin: filters.gainMin,
    gainMax: filters.gainMax,
    minRuns: filters.minRuns,
    maxVolts: filters.maxVolts,
    sort,
    page,
    pageSize: PARTS_PAGE_SIZE,
  };
  const filtered =
    Boolean(filters.q || filters.category) || [gainMin, gainMax, filters.minRuns, filters.maxVolts].some((v) => v !== undefined);
  return {
    filters,
    sort,
    page,
    query,
    filtered,
    /** The URL's search string, to reset drafts when someone navigates. */
    key: params.toString(),
    hrefFor: (p: number) => `${paths.parts}${toSearch(filters, sort, p)}`,
    clearHref: `${paths.parts}${toSearch({ q: '', category: undefined, gainMin: undefined, gainMax: undefined, minRuns: undefined, maxVolts: undefined }, sort, 1)}`,
    setFilters: (next: Partial<PartFilters>) => setParams(toSearch({ ...filters, ...next }, sort, 1)),
    setSort: (s: PartSort) => setParams(toSearch(filters, s, 1)),
  };
}

/** What `usePartSearch()` returns. */
export type PartSearch = ReturnType<typeof usePartSearch>;
