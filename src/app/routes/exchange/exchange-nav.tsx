import { useLocation } from 'react-router-dom';
import { can } from '@shared/policies.ts';
import { AnchorButton, LinkButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { toActor } from '@/features/session/to-actor.ts';

/** The exchange's own actions: new listing, my listings and the inbox when signed in; sign-in otherwise. */
export function ExchangeActions({ except }: { except?: 'new' | 'mine' | 'inbox' }) {
  const { data: session } = useSession();
  const location = useLocation();
  if (!session?.user) {
    return (
      <AnchorButton variant="secondary" href={paths.signIn(location.pathname + location.search)}>
        Sign in to post or write
      </AnchorButton>
    );
  }
  return (
    <div className="flex flex-wrap gap-2">
      {except !== 'inbox' && (
        <LinkButton variant="ghost" to={paths.inbox}>
          Inbox
        </LinkButton>
      )}
      {except !== 'mine' && (
        <LinkButton variant="secondary" to={paths.myListings}>
          My listings
        </LinkButton>
      )}
      {except !== 'new' && can(toActor(session.user), 'content.create') && <LinkButton to={paths.newListing}>New listing</LinkButton>}
    </div>
  );
}
