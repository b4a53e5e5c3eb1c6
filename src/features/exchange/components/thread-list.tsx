import { Link } from 'react-router-dom';
import type { ThreadSummaryDto } from '@shared/schemas/listing.ts';
import { UserBadge } from '@/components/ui/user-badge.tsx';
import { paths } from '@/config/paths.ts';
import { kindLabels } from './labels.ts';
import { formatMoment } from '@shared/format/dates.ts';

/** My conversations, latest first: who, about which listing, the last message and how many I have not read. */
export function ThreadList({ threads }: { threads: ThreadSummaryDto[] }) {
  return (
    <ul className="divide-y divide-rule overflow-hidden rounded-lg border border-rule bg-white">
      {threads.map((t) => (
        <li
          key={t.id}
          className={`relative flex gap-3 p-3 focus-within:ring-2 focus-within:ring-inset focus-within:ring-copper hover:bg-paper/70 ${t.unread > 0 ? 'bg-teal/5' : ''}`}
        >
          <UserBadge login={t.other.login} />
          <div className="min-w-0 flex-1">
            <div className="flex flex-wrap items-baseline justify-between gap-x-3">
              <h2 className={t.unread > 0 ? 'font-semibold' : 'font-medium'}>
                <Link to={paths.thread(t.id)} className="after:absolute after:inset-0 focus-visible:outline-none">
                  {t.other.login}
                </Link>
                <span className="ml-2 text-xs font-normal text-ink-soft">
                  {t.role === 'owner' ? 'wrote about your listing' : 'owns the listing'}
                </span>
              </h2>
              <span className="num text-xs text-ink-soft">{formatMoment(t.lastMessageAt)}</span>
            </div>
            <p className="text-sm text-ink-soft">
              {kindLabels[t.listing.kind]}: {t.listing.partName}
              {t.listing.status !== 'open' && ` (${t.listing.status})`}
            </p>
            <p className="mt-0.5 line-clamp-2 text-sm">{t.lastMessage}</p>
          </div>
          {t.unread > 0 && (
            <span className="num self-center rounded-full bg-copper px-2 py-0.5 text-xs font-semibold text-white">
              {t.unread}
              <span className="sr-only"> unread</span>
            </span>
          )}
        </li>
      ))}
    </ul>
  );
}
