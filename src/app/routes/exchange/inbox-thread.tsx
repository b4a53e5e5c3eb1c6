import { useEffect } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link, useLocation, useParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice.tsx';
import { AnchorButton } from '@/components/ui/link-button.tsx';
import { ApiError } from '@/lib/api-client.ts';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { inboxQueries } from '@/features/exchange/api/inbox-queries.ts';
import { useMarkThreadRead } from '@/features/exchange/api/message-mutations.ts';
import { LoadError, Loading } from '@/components/ui/load-states.tsx';
import { ThreadView } from '@/features/exchange/components/thread-view.tsx';
import { ExchangeNotFound } from './not-found.tsx';
import { parseId } from '@/utils/parse-id.ts';

/** /inbox/:threadId: one conversation; showing it marks it read (a POST), then the thread list is refetched. */
export function InboxThreadPage() {
  const id = parseId(useParams().threadId);
  const { data: session } = useSession();
  const location = useLocation();
  const signedIn = Boolean(session?.user);
  const thread = useQuery({ ...inboxQueries.thread(id ?? 0), enabled: id !== null && signedIn });
  const unread = thread.data?.unread ?? 0;
  const { mutate: markRead } = useMarkThreadRead(id ?? 0);
  // Reading is a GET that changes nothing; the page marks the thread read once it shows unread messages.
  useEffect(() => {
    if (unread > 0) markRead();
  }, [unread, markRead]);

  const notFound = <ExchangeNotFound what="conversation" back={paths.inbox} backLabel="Back to the inbox" />;
  if (!signedIn)
    return (
      <Notice title="Sign in to read this conversation">
        <p>
          <AnchorButton href={paths.signIn(location.pathname)}>Sign in</AnchorButton>
        </p>
      </Notice>
    );
  if (id === null) return notFound;
  if (thread.isPending) return <Loading>Loading the conversation…</Loading>;
  if (thread.isError) {
    if (thread.error instanceof ApiError && thread.error.status === 404) return notFound;
    return <LoadError what="this conversation" error={thread.error} onRetry={() => void thread.refetch()} />;
  }
  return (
    <div className="mx-auto max-w-3xl">
      <nav aria-label="Breadcrumb" className="mb-3 text-sm">
        <Link to={paths.inbox} className="text-copper-dark underline">
          Inbox
        </Link>
      </nav>
      <h1 className="mb-4 border-b border-rule pb-3 text-2xl font-semibold tracking-tight">Conversation with {thread.data.other.login}</h1>
      <ThreadView thread={thread.data} />
    </div>
  );
}
