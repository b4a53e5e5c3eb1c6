import { useSearchParams } from 'react-router-dom';
import { PART_CATEGORIES, PART_SORTS, type ListPartsQuery, type PartCategory, type PartSort } from '@shared/schemas/part.ts';
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

const num = (raw: string | null, max: number, int = false): number | undefined => {
  if (raw === null || raw.trim() === '') return undefined;
  const v = Number(raw);
  if (!Number.isFinite(v) || v < 0 || v > max) return undefined;
  return int ? Math.floor(v) : v;
};

function toSearch(f: PartFilters, sort: PartSort, page: number): string {
  const s = new URLSearchParams();
  if (f.q) s.set('q', f.q);
  if (f.category) s.set('category', f.category);
  if (f.gainMin !== undefined) s.set('gainMin', String(f.gainMin));
  if (f.gainMax !== undefined) s.set('gainMax', String(f.gainMax));
  if (f.minRuns !== undefined) s.set('minRuns', String(f.minRuns));
  if (f.maxVolts !== undefined) s.set('maxVolts', String(f.maxVolts));
  if (sort !== 'name') s.set('sort', sort);
  if (page > 1) s.set('page', String(page));
  const text = s.toString();
  return text ? `?${text}` : '';
}

/**
 * Filters, sort and page of the registry live in the URL (?q=&category=&gainMin=&gainMax=&minRuns=&maxVolts=&sort=&page=),
 * so a search can be shared; odd values fall back to "no filter". A reversed gain range is swapped.
 */
export function usePartSearch() {
  const [params, setParams] = useSearchParams();
  const rawCategory = params.get('category');
  const rawSort = params.get('sort');
  let gainMin = num(params.get('gainMin'), 1e7);
  let gainMax = num(params.get('gainMax'), 1e7);
  if (gainMin !== undefined && gainMax !== undefined && gainMin > gainMax) [gainMin, gainMax] = [gainMax, gainMin];
  const filters: PartFilters = {
    q: (params.get('q') ?? '').trim().slice(0, 100),
    category: PART_CATEGORIES.find((c) => c === rawCategory),
    gainMin,
    gainMax,
    minRuns: num(params.get('minRuns'), 1e6, true),
    maxVolts: num(params.get('maxVolts'), 1e5),
  };
  const sort: PartSort = PART_SORTS.find((s) => s === rawSort) ?? 'name';
  const page = Math.min(100_000, Math.max(1, Math.floor(Number(params.get('page'))) || 1));
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
