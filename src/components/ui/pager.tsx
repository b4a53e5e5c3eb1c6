import { Link } from 'react-router-dom';

const step = 'rounded-md border border-rule bg-white px-3 py-1.5 text-sm font-medium hover:border-copper';
const off = 'rounded-md border border-rule px-3 py-1.5 text-sm text-ink-soft/60';

/** Previous / "page N of M" / Next as links, so every page has an address that can be shared. */
export function Pager({
  page,
  pageCount,
  hrefFor,
  label = 'Pages',
}: {
  page: number;
  pageCount: number;
  hrefFor: (page: number) => string;
  label?: string;
}) {
  if (pageCount <= 1 && page <= 1) return null;
  const hasPrev = page > 1;
  const hasNext = page < pageCount;
  return (
    <nav aria-label={label} className="mt-6 flex items-center justify-center gap-3">
      {hasPrev ? (
        <Link className={step} to={hrefFor(Math.min(page - 1, pageCount))} rel="prev">
          Previous
        </Link>
      ) : (
        <span className={off} aria-disabled="true">
          Previous
        </span>
      )}
      <span className="text-sm text-ink-soft" aria-current="page">
        page <span className="num text-ink">{page}</span> of <span className="num text-ink">{pageCount}</span>
      </span>
      {hasNext ? (
        <Link className={step} to={hrefFor(page + 1)} rel="next">
          Next
        </Link>
      ) : (
        <span className={off} aria-disabled="true">
          Next
        </span>
      )}
    </nav>
  );
}
