import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { Pager } from '@/components/ui/pager.tsx';
import { listingQueries } from '@/features/exchange/api/listing-queries.ts';
import { ListingCard } from '@/features/exchange/components/listing-card.tsx';
import { ListingFilters } from '@/features/exchange/components/listing-filters.tsx';
import { LoadError, Loading } from '@/components/ui/load-states.tsx';
import { useListingSearch } from '@/features/exchange/components/use-listing-search.ts';
import { ExchangeActions } from './exchange-nav.tsx';

/** /exchange: open and reserved listings, offering or seeking spare parts, newest first. */
export function ExchangeIndexPage() {
  const search = useListingSearch();
  const listings = useQuery(listingQueries.list(search.query));
  const pageCount = listings.data ? Math.max(1, Math.ceil(listings.data.total / listings.data.pageSize)) : 1;
  return (
    <div>
      <PageHeader
        title="Exchange"
        lead="Spare parts offered and sought by makers. Write to a listing's owner through Scanwright; e-mail addresses stay private."
        actions={<ExchangeActions />}
      />
      <ListingFilters search={search} />
      {listings.isPending ? (
        <Loading>Loading listings…</Loading>
      ) : listings.isError ? (
        <LoadError what="the exchange" error={listings.error} onRetry={() => void listings.refetch()} />
      ) : listings.data.items.length === 0 ? (
        <div className="rounded-lg border border-dashed border-rule bg-white p-6 text-center">
          <p className="font-medium">{search.filtered ? 'No listing matches these filters.' : 'Nothing is offered or sought yet.'}</p>
          {search.filtered && (
            <p className="mt-1 text-sm text-ink-soft">
              <Link to={search.clearHref} className="text-copper-dark underline">
                Clear the filters
              </Link>{' '}
              to see every listing.
            </p>
          )}
        </div>
      ) : (
        <>
          <p className="mb-3 text-sm text-ink-soft" aria-live="polite">
            <span className="num font-semibold text-ink">{listings.data.total}</span> {listings.data.total === 1 ? 'listing' : 'listings'}
          </p>
          <ul className={`grid gap-4 sm:grid-cols-2 lg:grid-cols-3 ${listings.isPlaceholderData ? 'opacity-60' : ''}`}>
            {listings.data.items.map((l) => (
              <li key={l.id} className="flex">
                <ListingCard listing={l} />
              </li>
            ))}
          </ul>
          <Pager page={search.page} pageCount={pageCount} hrefFor={search.hrefFor} label="Exchange pages" />
        </>
      )}
    </div>
  );
}
