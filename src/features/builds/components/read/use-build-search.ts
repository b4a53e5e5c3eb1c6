import { useSearchParams } from 'react-router-dom';
import { INSTRUMENT_KINDS, type InstrumentKind, type ListBuildsQuery } from '@shared/schemas/build.ts';
import { paths } from '@/config/paths.ts';

/** Cards per page of the builds index. */
export const BUILDS_PAGE_SIZE = 12;
const MAX_Q = 100;

interface Filters {
  q: string;
  kind: InstrumentKind | undefined;
}

function toSearch({ q, kind }: Filters, page = 1): string {
  const s = new URLSearchParams();
  if (q) s.set('q', q);
  if (kind) s.set('kind', kind);
  if (page > 1) s.set('page', String(page));
  const text = s.toString();
  return text ? `?${text}` : '';
}

/** The index's search lives in the URL (?q=&kind=&page=) so a search can be shared; odd values fall back to defaults. */
export function useBuildSearch() {
  const [params, setParams] = useSearchParams();
  const q = (params.get('q') ?? '').trim().slice(0, MAX_Q);
  const rawKind = params.get('kind');
  const kind = INSTRUMENT_KINDS.find((k) => k === rawKind);
  const page = Math.min(10_000, Math.max(1, Math.floor(Number(params.get('page'))) || 1));
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
