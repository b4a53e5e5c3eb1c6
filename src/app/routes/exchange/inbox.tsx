import { useQuery } from '@tanstack/react-query';
import { useLocation } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { AnchorButton, LinkButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { inboxQueries } from '@/features/exchange/api/inbox-queries.ts';
import { LoadError, Loading } from '@/components/ui/load-states.tsx';
import { ThreadList } from '@/features/exchange/components/thread-list.tsx';

/** /inbox: conversations about listings, mine and others', latest first. */
export function InboxPage() {
  const { data: session } = useSession();
  const location = useLocation();
  const signedIn = Boolean(session?.user);
  const threads = useQuery({ ...inboxQueries.threads(), enabled: signedIn });
  const header = (
    <PageHeader
      title="Inbox"
      lead="Messages about exchange listings. Nobody here sees anyone's e-mail address."
      actions={
        <LinkButton variant="secondary" to={paths.exchange}>
          Exchange
        </LinkButton>
      }
    />
  );
  if (!signedIn) {
    return (
      <div>
        {header}
        <Notice title="Sign in to read your messages">
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
      {threads.isPending ? (
        <Loading>Loading your messages…</Loading>
      ) : threads.isError ? (
        <LoadError what="your inbox" error={threads.error} onRetry={() => void threads.refetch()} />
      ) : threads.data.length === 0 ? (
        <div className="rounded-lg border border-dashed border-rule bg-white p-6 text-center">
          <p className="font-medium">No messages yet.</p>
          <p className="mt-1 text-sm text-ink-soft">
            When you write to a listing's owner, or someone writes about yours, the conversation shows here.
          </p>
        </div>
      ) : (
        <ThreadList threads={threads.data} />
      )}
    </div>
  );
}
