import { useSearchParams } from 'react-router-dom';
import { listPartsQuery, type ListPartsQuery, type PartSort } from '@shared/schemas/part.ts';
import { type PartCategory } from '@shared/schemas/part-vocabulary.ts';
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
  /** Rated for at least / at most this many volts. */
  minVolts: number | undefined;
  maxVolts: number | undefined;
  /** A voltage filter keeps parts with no stated rating too. */
  unrated: 'include' | undefined;
}

const NO_FILTERS: PartFilters = {
  q: '',
  category: undefined,
  gainMin: undefined,
  gainMax: undefined,
  minRuns: undefined,
  minVolts: undefined,
  maxVolts: undefined,
  unrated: undefined,
};

const toSearch = (f: PartFilters, sort: PartSort, page: number) => writeSearch({ ...f, sort, page }, { sort: 'name', page: 1 });

/**
 * Filters, sort and page of the registry live in the URL (?q=&category=&gainMin=&gainMax=&minRuns=&minVolts=&maxVolts=&unrated=&sort=&page=),
 * so a search can be shared; they are read with the API's own query schema, field by field, and odd values
 * fall back to "no filter". A reversed gain or voltage range is swapped.
 */
export function usePartSearch() {
  const [params, setParams] = useSearchParams();
  const read = readSearch(listPartsQuery, params, ['pageSize', 'format']);
  let { gainMin, gainMax } = read;
  if (gainMin !== undefined && gainMax !== undefined && gainMin > gainMax) [gainMin, gainMax] = [gainMax, gainMin];
  let { minVolts, maxVolts } = read;
  if (minVolts !== undefined && maxVolts !== undefined && minVolts > maxVolts) [minVolts, maxVolts] = [maxVolts, minVolts];
  const filters: PartFilters = {
    q: read.q ?? '',
    category: read.category,
    gainMin,
    gainMax,
    minRuns: read.minRuns,
    minVolts,
    maxVolts,
    unrated: read.unrated,
  };
  const sort: PartSort = read.sort ?? 'name';
  const page = read.page ?? 1;
  const query: Partial<ListPartsQuery> = {
    q: filters.q || undefined,
    category: filters.category,
    gainMin: filters.gainMin,
    gainMax: filters.gainMax,
    minRuns: filters.minRuns,
    minVolts: filters.minVolts,
    maxVolts: filters.maxVolts,
    unrated: filters.unrated,
    sort,
    page,
    pageSize: PARTS_PAGE_SIZE,
  };
  const filtered =
    Boolean(filters.q || filters.category) ||
    [gainMin, gainMax, filters.minRuns, minVolts, maxVolts, filters.unrated].some((v) => v !== undefined);
  return {
    filters,
    sort,
    page,
    query,
    filtered,
    /** The URL's search string, to reset drafts when someone navigates. */
    key: params.toString(),
    hrefFor: (p: number) => `${paths.parts}${toSearch(filters, sort, p)}`,
    clearHref: `${paths.parts}${toSearch(NO_FILTERS, sort, 1)}`,
    setFilters: (next: Partial<PartFilters>) => setParams(toSearch({ ...filters, ...next }, sort, 1)),
    setSort: (s: PartSort) => setParams(toSearch(filters, s, 1)),
  };
}

/** What `usePartSearch()` returns. */
export type PartSearch = ReturnType<typeof usePartSearch>;
