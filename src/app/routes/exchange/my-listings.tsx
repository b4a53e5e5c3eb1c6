import { useQuery } from '@tanstack/react-query';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { LinkButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { listingQueries } from '@/features/exchange/api/listing-queries.ts';
import { EmptyState, QueryBlock, SignInFirst } from '@/components/ui/load-states.tsx';
import { MyListingRow } from '@/features/exchange/components/my-listing-row.tsx';
import { ExchangeActions } from './exchange-nav.tsx';

/** /exchange/mine: every listing I posted, in any state, with reserve / reopen / close at hand. */
export function MyListingsPage() {
  const { data: session } = useSession();
  const signedIn = Boolean(session?.user);
  const mine = useQuery({ ...listingQueries.mine(), enabled: signedIn });
  const header = (
    <PageHeader
      title="My listings"
      lead="Open, reserved and closed. Reserve a listing when you have promised the parts; close it when they are gone."
      actions={signedIn ? <ExchangeActions except="mine" /> : undefined}
    />
  );
  return (
    <div>
      {header}
      {!signedIn ? (
        <SignInFirst title="Sign in to see your listings" />
      ) : (
        <QueryBlock query={mine} loading="Loading your listings…" what="your listings">
          {(data) =>
            data.items.length === 0 ? (
              <EmptyState title="You have no listings yet.">
                <p className="mt-3">
                  <LinkButton to={paths.newListing}>Post your first listing</LinkButton>
                </p>
              </EmptyState>
            ) : (
              <ul className="space-y-3">
                {data.items.map((l) => (
                  <MyListingRow key={l.id} listing={l} />
                ))}
              </ul>
            )
          }
        </QueryBlock>
      )}
    </div>
  );
}
