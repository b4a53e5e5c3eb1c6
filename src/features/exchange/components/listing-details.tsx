import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { type ListingDto } from '@shared/schemas/listing.ts';
import { listingConditionLabels } from '@shared/schemas/listing-vocabulary.ts';
import { partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { Markdown } from '@/components/ui/markdown.tsx';
import { paths } from '@/config/paths.ts';
import { formatShort } from '@shared/format/measured-number.ts';
import { formatDate } from '@shared/format/dates.ts';
import { ListingPhotos } from './listing-photos.tsx';

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="grid grid-cols-[8rem_1fr] gap-2 border-b border-rule py-1.5 last:border-b-0">
      <dt className="text-sm text-ink-soft">{label}</dt>
      <dd className="min-w-0 text-sm">{children}</dd>
    </div>
  );
}

/** Photos (a drawn tile while there are none), the facts of the listing and the owner's notes. */
export function ListingDetails({ listing: l }: { listing: ListingDto }) {
  return (
    <div className="space-y-4">
      <ListingPhotos listing={l} />
      <dl className="rounded-lg border border-rule bg-white px-3 py-1">
        <Row label="Part">
          <Link to={paths.part(l.part.id)} className="text-copper-dark underline decoration-copper/40 underline-offset-2">
            {l.part.name}
          </Link>
          <span className="text-ink-soft"> · {partCategoryLabels[l.part.category]}</span>
          {l.part.gainMedianNmPerV !== null && (
            <span className="block text-xs text-ink-soft">
              registry median <span className="num text-ink">{formatShort(l.part.gainMedianNmPerV)} nm/V</span>
            </span>
          )}
        </Row>
        <Row label="Quantity">
          <span className="num">{l.quantity}</span>
        </Row>
        <Row label="Condition">{listingConditionLabels[l.condition]}</Row>
        <Row label="Price">
          <span className={l.priceKind === 'price' ? 'num' : 'font-medium text-teal-dark'}>{l.priceLabel}</span>
        </Row>
        <Row label="Region">{l.region}</Row>
        <Row label="Ships to">{l.shipsTo ?? <span className="text-ink-soft">not stated</span>}</Row>
        <Row label="Posted by">{l.owner.login}</Row>
        <Row label="Posted">
          <span className="num">{formatDate(l.createdAt)}</span>
        </Row>
      </dl>
      {l.notes && (
        <div className="rounded-lg border border-rule bg-white p-3">
          <h2 className="mb-1 text-sm font-semibold">Notes</h2>
          <Markdown className="text-sm">{l.notes}</Markdown>
        </div>
      )}
    </div>
  );
}
