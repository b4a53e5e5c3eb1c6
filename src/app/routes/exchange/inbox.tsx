import { useQuery } from '@tanstack/react-query';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { LinkButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { inboxQueries } from '@/features/exchange/api/inbox-queries.ts';
import { EmptyState, QueryBlock, SignInFirst } from '@/components/ui/load-states.tsx';
import { ThreadList } from '@/features/exchange/components/thread-list.tsx';

/** /inbox: conversations about listings, mine and others', latest first. */
export function InboxPage() {
  const { data: session } = useSession();
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
  return (
    <div>
      {header}
      {!signedIn ? (
        <SignInFirst title="Sign in to read your messages" />
      ) : (
        <QueryBlock query={threads} loading="Loading your messages…" what="your inbox">
          {(list) =>
            list.length === 0 ? (
              <EmptyState title="No messages yet.">
                <p className="mt-1 text-sm text-ink-soft">
                  When you write to a listing's owner, or someone writes about yours, the conversation shows here.
                </p>
              </EmptyState>
            ) : (
              <ThreadList threads={list} />
            )
          }
        </QueryBlock>
      )}
    </div>
  );
}
