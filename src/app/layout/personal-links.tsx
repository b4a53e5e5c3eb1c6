import { useEffect } from 'react';
import { NavLink, useLocation } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { paths } from '@/config/paths.ts';
import { notificationQueries } from '@/features/notifications/api/notifications.ts';

type Badge = 'notifications' | 'messages';
const links: Array<{ to: string; label: string; badge?: Badge; badgeWord?: string }> = [
  { to: paths.myBuilds, label: 'My builds' },
  { to: paths.myListings, label: 'My listings' },
  { to: paths.notifications, label: 'Notifications', badge: 'notifications', badgeWord: 'unread' },
  { to: paths.inbox, label: 'Inbox', badge: 'messages', badgeWord: 'unread messages' },
  { to: paths.account, label: 'Mail settings' },
];

/** A thin bar of the signed-in maker's own places, under the main navigation, with unread counts as badges. */
export function PersonalLinks() {
  const counts = useQuery(notificationQueries.counts());
  const { pathname } = useLocation();
  const { refetch } = counts;
  // A page visit may have read something (a thread, a notification): recount.
  useEffect(() => {
    void refetch();
  }, [pathname, refetch]);
  return (
    <nav aria-label="Your pages" className="border-b border-rule bg-paper-deep/60">
      <ul className="mx-auto flex max-w-6xl flex-wrap gap-x-4 gap-y-1 px-4 py-1.5 text-xs">
        {links.map((l) => {
          const n = l.badge ? (counts.data?.[l.badge] ?? 0) : 0;
          return (
            <li key={l.to}>
              <NavLink
                to={l.to}
                end
                className={({ isActive }) => (isActive ? 'font-semibold text-copper-dark' : 'text-ink-soft hover:text-copper')}
              >
                {l.label}
                {n > 0 && ' '}
                {n > 0 && (
                  <span className="num ml-1 rounded-full bg-copper px-1.5 py-px text-[11px] font-semibold text-white">
                    {n > 99 ? '99+' : n}
                    <span className="sr-only"> {l.badgeWord}</span>
                  </span>
                )}
              </NavLink>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
