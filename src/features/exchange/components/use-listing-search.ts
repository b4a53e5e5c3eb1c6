import { useSearchParams } from 'react-router-dom';
import {
  LISTING_CONDITIONS,
  LISTING_KINDS,
  type ListingCondition,
  type ListingKind,
  type ListListingsQuery,
} from '@shared/schemas/listing.ts';
import { PART_CATEGORIES, type PartCategory } from '@shared/schemas/part.ts';
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

function toSearch(f: ListingFilters, page = 1): string {
  const s = new URLSearchParams();
  if (f.q) s.set('q', f.q);
  if (f.kind) s.set('kind', f.kind);
  if (f.category) s.set('category', f.category);
  if (f.condition) s.set('condition', f.condition);
  if (f.region) s.set('region', f.region);
  if (f.freeOnly) s.set('freeOnly', 'true');
  if (page > 1) s.set('page', String(page));
  const text = s.toString();
  return text ? `?${text}` : '';
}

const pick = <T extends string>(list: readonly T[], raw: string | null) => list.find((v) => v === raw);

/** The exchange's filters and page live in the URL (?q=&kind=&category=&condition=&region=&freeOnly=&page=); odd values are ignored. */
export function useListingSearch() {
  const [params, setParams] = useSearchParams();
  const filters: ListingFilters = {
    q: (params.get('q') ?? '').trim().slice(0, 100),
    kind: pick(LISTING_KINDS, params.get('kind')),
    category: pick(PART_CATEGORIES, params.get('category')),
    condition: pick(LISTING_CONDITIONS, params.get('condition')),
    region: (params.get('region') ?? '').trim().slice(0, 80),
    freeOnly: params.get('freeOnly') === 'true' || params.get('freeOnly') === '1',
  };
  const page = Math.min(100_000, Math.max(1, Math.floor(Number(params.get('page'))) || 1));
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
