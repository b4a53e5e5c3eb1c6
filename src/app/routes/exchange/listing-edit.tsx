import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { ApiError } from '@/lib/api-client.ts';
import { paths } from '@/config/paths.ts';
import { listingQueries } from '@/features/exchange/api/listing-queries.ts';
import { useUpdateListing } from '@/features/exchange/api/listing-mutations.ts';
import { ListingForm } from '@/features/exchange/components/listing-form.tsx';
import { LoadError, Loading } from '@/components/ui/load-states.tsx';
import { ExchangeNotFound } from './not-found.tsx';
import { parseId } from '@/utils/parse-id.ts';

/** /exchange/:listingId/edit: the owner changes their listing. */
export function ListingEditPage() {
  const id = parseId(useParams().listingId);
  const navigate = useNavigate();
  const listing = useQuery({ ...listingQueries.detail(id ?? 0), enabled: id !== null });
  const update = useUpdateListing(id ?? 0);
  const notFound = <ExchangeNotFound what="listing" back={paths.exchange} backLabel="Back to the exchange" />;
  if (id === null) return notFound;
  if (listing.isPending) return <Loading>Loading the listing…</Loading>;
  if (listing.isError) {
    if (listing.error instanceof ApiError && listing.error.status === 404) return notFound;
    return <LoadError what="this listing" error={listing.error} onRetry={() => void listing.refetch()} />;
  }
  const l = listing.data;
  const header = (
    <PageHeader
      title="Edit listing"
      lead={
        <Link to={paths.listing(l.id)} className="text-copper-dark underline">
          Back to the listing
        </Link>
      }
    />
  );
  if (!l.abilities.edit || l.status === 'closed') {
    return (
      <div>
        {header}
        <Notice tone="caution" title="You cannot edit this listing">
          {l.status === 'closed' ? 'It is closed.' : 'Only its owner can change it.'}
        </Notice>
      </div>
    );
  }
  return (
    <div>
      {header}
      <ListingForm
        defaults={{
          partId: l.part.id,
          kind: l.kind,
          quantity: l.quantity,
          condition: l.condition,
          priceKind: l.priceKind,
          priceAmount: l.priceAmount,
          currency: l.currency ?? 'EUR',
          region: l.region,
          shipsTo: l.shipsTo ?? '',
          notes: l.notes ?? '',
        }}
        submitLabel="Save changes"
        onSave={async (input) => {
          await update.mutateAsync(input);
          navigate(paths.listing(l.id));
        }}
      />
    </div>
  );
}
