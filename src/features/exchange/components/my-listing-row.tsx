import { Link } from 'react-router-dom';
import type { ListingDto } from '@shared/schemas/listing.ts';
import { StatusBadge } from '@/components/ui/status-badge.tsx';
import { paths } from '@/config/paths.ts';
import { KindBadge } from './kind-badge.tsx';
import { statusBadge } from './labels.ts';
import { formatDate } from '@shared/format/dates.ts';
import { ListingThumb } from './listing-thumb.tsx';
import { StatusButtons } from './owner-controls.tsx';

/** One of my listings with its state and the changes I can make right here. */
export function MyListingRow({ listing: l }: { listing: ListingDto }) {
  const badge = statusBadge[l.status];
  return (
    <li className="grid gap-3 rounded-lg border border-rule bg-white p-3 sm:grid-cols-[7rem_1fr_auto] sm:items-start">
      <ListingThumb listing={l} className="hidden aspect-[4/3] rounded-md sm:block" />
      <div className="min-w-0 space-y-1">
        <div className="flex flex-wrap items-center gap-2">
          <KindBadge kind={l.kind} />
          <StatusBadge tone={badge.tone}>{badge.label}</StatusBadge>
          {l.hidden && <StatusBadge tone="danger">Hidden by a moderator</StatusBadge>}
        </div>
        <h2 className="font-semibold">
          <Link to={paths.listing(l.id)} className="text-copper-dark underline decoration-copper/40 underline-offset-2">
            <span className="num">{l.quantity}</span> × {l.part.name}
          </Link>
        </h2>
        <p className="text-sm text-ink-soft">
          <span className={l.priceKind === 'price' ? 'num text-ink' : 'text-ink'}>{l.priceLabel}</span> · {l.region} · changed{' '}
          <span className="num">{formatDate(l.updatedAt)}</span>
        </p>
        {l.hidden && l.hiddenNote && <p className="text-sm text-danger">Moderator's note: {l.hiddenNote}</p>}
      </div>
      <div className="flex flex-wrap items-start gap-2 sm:justify-end">
        {l.status !== 'closed' && (
          <Link
            to={paths.editListing(l.id)}
            className="rounded-md border border-transparent px-3 py-1.5 text-sm font-medium text-copper-dark underline hover:bg-paper-deep"
            aria-label={`Edit listing: ${l.quantity} × ${l.part.name}`}
          >
            Edit
          </Link>
        )}
        <StatusButtons listing={l} compact />
      </div>
    </li>
  );
}
