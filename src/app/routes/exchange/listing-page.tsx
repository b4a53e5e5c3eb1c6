import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { ApiError } from '@/lib/api-client.ts';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { listingQueries } from '@/features/exchange/api/listing-queries.ts';
import { ListingView } from '@/features/exchange/components/listing-view.tsx';
import { LoadError, Loading } from '@/components/ui/load-states.tsx';
import { ExchangeNotFound } from './not-found.tsx';
import { parseId } from '@/utils/parse-id.ts';

/** /exchange/:listingId: a listing's details, the contact form, and the owner's and moderators' controls. */
export function ListingPage() {
  const id = parseId(useParams().listingId);
  const { data: session } = useSession();
  const listing = useQuery({ ...listingQueries.detail(id ?? 0), enabled: id !== null });
  const notFound = <ExchangeNotFound what="listing" back={paths.exchange} backLabel="Back to the exchange" />;
  if (id === null) return notFound;
  if (listing.isPending) return <Loading>Loading the listing…</Loading>;
  if (listing.isError) {
    if (listing.error instanceof ApiError && listing.error.status === 404) return notFound;
    return <LoadError what="this listing" error={listing.error} onRetry={() => void listing.refetch()} />;
  }
  return <ListingView listing={listing.data} signedIn={Boolean(session?.user)} />;
}
