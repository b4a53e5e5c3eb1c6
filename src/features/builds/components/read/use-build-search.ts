import { useSearchParams } from 'react-router-dom';
import { listBuildsQuery, type ListBuildsQuery } from '@shared/schemas/build.ts';
import { type InstrumentKind } from '@shared/schemas/build-vocabulary.ts';
import { readSearch, writeSearch } from '@/lib/url-search.ts';
import { paths } from '@/config/paths.ts';

/** Cards per page of the builds index. */
export const BUILDS_PAGE_SIZE = 12;
const MAX_Q = 100;

interface Filters {
  q: string;
  kind: InstrumentKind | undefined;
}

const toSearch = ({ q, kind }: Filters, page = 1) => writeSearch({ q, kind, page }, { page: 1 });

/**
 * The index's search lives in the URL (?q=&kind=&page=) so a search can be shared; it is read with the
 * API's own query schema, and odd values fall back to defaults.
 */
export function useBuildSearch() {
  const [params, setParams] = useSearchParams();
  const read = readSearch(listBuildsQuery, params, ['pageSize']);
  const q = read.q ?? '';
  const kind = read.kind;
  const page = read.page ?? 1;
  const query: Partial<ListBuildsQuery> = { q: q || undefined, kind, page, pageSize: BUILDS_PAGE_SIZE };
  return {
    q,
    kind,
    page,
    query,
    filtered: Boolean(q || kind),
    hrefFor: (p: number) => `${paths.builds}${toSearch({ q, kind }, p)}`,
    clearHref: paths.builds,
    setFilters: (next: Partial<Filters>) =>
      setParams(toSearch({ q, kind, ...next, ...(next.q !== undefined ? { q: next.q.trim().slice(0, MAX_Q) } : {}) })),
  };
}
