import { useQuery } from '@tanstack/react-query';
import { useLocation } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { AnchorButton, LinkButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { listingQueries } from '@/features/exchange/api/listing-queries.ts';
import { LoadError, Loading } from '@/components/ui/load-states.tsx';
import { MyListingRow } from '@/features/exchange/components/my-listing-row.tsx';
import { ExchangeActions } from './exchange-nav.tsx';

/** /exchange/mine: every listing I posted, in any state, with reserve / reopen / close at hand. */
export function MyListingsPage() {
  const { data: session } = useSession();
  const location = useLocation();
  const signedIn = Boolean(session?.user);
  const mine = useQuery({ ...listingQueries.mine(), enabled: signedIn });
  const header = (
    <PageHeader
      title="My listings"
      lead="Open, reserved and closed. Reserve a listing when you have promised the parts; close it when they are gone."
      actions={signedIn ? <ExchangeActions except="mine" /> : undefined}
    />
  );
  if (!signedIn) {
    return (
      <div>
        {header}
        <Notice title="Sign in to see your listings">
          <p>
            <AnchorButton href={paths.signIn(location.pathname)}>Sign in</AnchorButton>
          </p>
        </Notice>
      </div>
    );
  }
  return (
    <div>
      {header}
      {mine.isPending ? (
        <Loading>Loading your listings…</Loading>
      ) : mine.isError ? (
        <LoadError what="your listings" error={mine.error} onRetry={() => void mine.refetch()} />
      ) : mine.data.items.length === 0 ? (
        <div className="rounded-lg border border-dashed border-rule bg-white p-6 text-center">
          <p className="font-medium">You have no listings yet.</p>
          <p className="mt-3">
            <LinkButton to={paths.newListing}>Post your first listing</LinkButton>
          </p>
        </div>
      ) : (
        <ul className="space-y-3">
          {mine.data.items.map((l) => (
            <MyListingRow key={l.id} listing={l} />
          ))}
        </ul>
      )}
    </div>
  );
}
