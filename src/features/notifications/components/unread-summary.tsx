import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { paths } from '@/config/paths.ts';
import { notificationQueries } from '../api/notifications.ts';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** One line for the signed-in home page: unread messages and notifications, each a link; nothing when all is read. */
export function UnreadSummary() {
  const counts = useQuery(notificationQueries.counts());
  if (!counts.data || (counts.data.messages === 0 && counts.data.notifications === 0)) return null;
  const { messages, notifications } = counts.data;
  return (
    <p className="rounded-lg border border-copper/40 bg-copper/5 px-4 py-3 text-sm">
      Waiting for you:{' '}
      {messages > 0 && (
        <Link to={paths.inbox} className="font-medium text-copper underline">
          {plural(messages, 'unread message', 'unread messages')}
        </Link>
      )}
      {messages > 0 && notifications > 0 && ' · '}
      {notifications > 0 && (
        <Link to={paths.notifications} className="font-medium text-copper underline">
          {plural(notifications, 'unread notification', 'unread notifications')}
        </Link>
      )}
    </p>
  );
}
