import { Link } from 'react-router-dom';
import { type ListingDto } from '@shared/schemas/listing.ts';
import { listingConditionLabels } from '@shared/schemas/listing-vocabulary.ts';
import { partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { StatusBadge } from '@/components/ui/status-badge.tsx';
import { paths } from '@/config/paths.ts';
import { formatShort } from '@shared/format/measured-number.ts';
import { KindBadge } from './kind-badge.tsx';
import { ListingThumb } from './listing-thumb.tsx';
import { statusBadge } from './labels.ts';

/** One listing on the exchange: kind, part, quantity, condition, price, the part's registry gain, where it is and who posted it. */
export function ListingCard({ listing: l }: { listing: ListingDto }) {
  return (
    <article className="relative flex w-full flex-col overflow-hidden rounded-lg border border-rule bg-white transition-colors focus-within:ring-2 focus-within:ring-copper hover:border-copper">
      <ListingThumb listing={l} />
      <div className="flex flex-1 flex-col gap-2 p-4">
        <div className="flex flex-wrap items-center gap-2">
          <KindBadge kind={l.kind} />
          {l.status !== 'open' && <StatusBadge tone={statusBadge[l.status].tone}>{statusBadge[l.status].label}</StatusBadge>}
          <span className="text-xs text-ink-soft">{partCategoryLabels[l.part.category]}</span>
        </div>
        <h2 className="font-semibold leading-snug">
          <Link to={paths.listing(l.id)} className="after:absolute after:inset-0 focus-visible:outline-none">
            <span className="num">{l.quantity}</span> × {l.part.name}
          </Link>
        </h2>
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
          <dt className="text-ink-soft">Condition</dt>
          <dd>{listingConditionLabels[l.condition]}</dd>
          <dt className="text-ink-soft">Price</dt>
          <dd className={l.priceKind === 'price' ? 'num' : 'font-medium text-teal-dark'}>{l.priceLabel}</dd>
          <dt className="text-ink-soft">Registry gain</dt>
          <dd>
            <Link to={paths.part(l.part.id)} className="relative z-10 text-copper-dark underline decoration-copper/40 underline-offset-2">
              {l.part.gainMedianNmPerV === null ? (
                'no accepted runs yet'
              ) : (
                <>
                  <span className="num">{formatShort(l.part.gainMedianNmPerV)} nm/V</span> median
                </>
              )}
            </Link>
          </dd>
          <dt className="text-ink-soft">Region</dt>
          <dd>{l.region}</dd>
          {l.shipsTo && (
            <>
              <dt className="text-ink-soft">Ships to</dt>
              <dd>{l.shipsTo}</dd>
            </>
          )}
        </dl>
        <p className="mt-auto pt-1 text-xs text-ink-soft">
          by <span className="font-medium text-ink">{l.owner.login}</span>
        </p>
      </div>
    </article>
  );
}
