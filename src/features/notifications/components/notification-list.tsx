import { Link } from 'react-router-dom';
import { useInfiniteQuery } from '@tanstack/react-query';
import type { NotificationDto, NotificationKind } from '@shared/schemas/notification.ts';
import { formatDateTime } from '@shared/format/dates.ts';
import { Button } from '@/components/ui/button.tsx';
import { EmptyState, LoadError, Loading } from '@/components/ui/load-states.tsx';
import { errorMessage } from '@/components/ui/form-bits.tsx';
import { notificationQueries, useMarkNotificationsRead } from '../api/notifications.ts';

const kindWords: Record<NotificationKind, string> = {
  review: 'Review',
  'review-thread': 'Review thread',
  comment: 'Comment',
  'follow-entry': 'Followed build',
  'follow-run': 'Followed part',
  'follow-build': 'Followed maker',
};

function Row({ n, onOpen }: { n: NotificationDto; onOpen: (n: NotificationDto) => void }) {
  return (
    <li className={`flex flex-wrap items-baseline gap-x-3 gap-y-1 border-b border-rule px-3 py-3 ${n.read ? '' : 'bg-copper/5'}`}>
      <span className="w-full shrink-0 text-xs font-medium uppercase tracking-wide text-teal-dark sm:w-28">{kindWords[n.kind]}</span>
      <Link
        to={n.path}
        onClick={() => onOpen(n)}
        className={`min-w-0 flex-1 hover:underline ${n.read ? 'text-ink-soft' : 'font-medium text-ink'}`}
      >
        {!n.read && <span className="sr-only">Unread: </span>}
        {n.text}
      </Link>
      <span className="num text-xs text-ink-soft">{formatDateTime(n.createdAt)}</span>
    </li>
  );
}

/** My notifications, newest first: unread ones stand out; opening one marks it read; "Mark all read". */
export function NotificationList() {
  const list = useInfiniteQuery(notificationQueries.list());
  const mark = useMarkNotificationsRead();
  if (list.isPending) return <Loading>Loading your notifications…</Loading>;
  if (list.isError) return <LoadError what="your notifications" error={list.error} onRetry={() => void list.refetch()} />;
  const items = list.data.pages.flatMap((p) => p.items);
  const unread = list.data.pages[0]?.unread ?? 0;
  if (!items.length)
    return (
      <EmptyState title="Nothing yet">
        Decisions on your work, posts in your review threads, comments on your builds and news from what you follow appear here.
      </EmptyState>
    );
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm text-ink-soft" role="status">
          {unread === 0 ? 'All read.' : `${unread} unread.`}
        </p>
        {unread > 0 && (
          <Button variant="secondary" disabled={mark.isPending} onClick={() => mark.mutate(undefined)}>
            Mark all read
          </Button>
        )}
      </div>
      {mark.isError && (
        <p role="alert" className="text-sm text-danger">
          {errorMessage(mark.error)}
        </p>
      )}
      <ul className="rounded-lg border border-rule bg-white">
        {items.map((n) => (
          <Row key={n.id} n={n} onOpen={(x) => !x.read && mark.mutate([x.id])} />
        ))}
      </ul>
      {list.hasNextPage && (
        <Button variant="ghost" disabled={list.isFetchingNextPage} onClick={() => void list.fetchNextPage()}>
          {list.isFetchingNextPage ? 'Loading…' : 'Show older'}
        </Button>
      )}
    </div>
  );
}
