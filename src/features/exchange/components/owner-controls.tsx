import { useState } from 'react';
import type { ListingDto } from '@shared/schemas/listing.ts';
import type { ListingStatus } from '@shared/schemas/listing-vocabulary.ts';
import { Button } from '@/components/ui/button.tsx';
import { LinkButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useUpdateListing } from '../api/listing-mutations.ts';
import { FormError } from '@/components/ui/form-bits.tsx';

/** The state changes an owner can make from a state: open ⇄ reserved, either → closed (for good). */
export const nextStates: Record<ListingStatus, { to: ListingStatus; label: string }[]> = {
  open: [
    { to: 'reserved', label: 'Mark reserved' },
    { to: 'closed', label: 'Close' },
  ],
  reserved: [
    { to: 'open', label: 'Reopen' },
    { to: 'closed', label: 'Close' },
  ],
  closed: [],
};

/** Reserve / reopen / close buttons; closing asks once more, since a closed listing stays closed. */
export function StatusButtons({ listing, compact = false }: { listing: ListingDto; compact?: boolean }) {
  const update = useUpdateListing(listing.id);
  const [confirmClose, setConfirmClose] = useState(false);
  const what = `${listing.quantity} × ${listing.part.name}`;
  const change = (status: ListingStatus) => update.mutate({ status }, { onSuccess: () => setConfirmClose(false) });
  if (listing.status === 'closed')
    return <p className="text-sm text-ink-soft">Closed listings stay closed; post a new one if you have more.</p>;
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap gap-2">
        {nextStates[listing.status].map((s) =>
          s.to === 'closed' ? (
            <Button
              key={s.to}
              variant="danger"
              disabled={update.isPending}
              onClick={() => (confirmClose ? change('closed') : setConfirmClose(true))}
              aria-label={compact ? `${confirmClose ? 'Yes, close' : 'Close'}: ${what}` : undefined}
            >
              {confirmClose ? 'Yes, close it' : s.label}
            </Button>
          ) : (
            <Button
              key={s.to}
              variant="secondary"
              disabled={update.isPending}
              onClick={() => change(s.to)}
              aria-label={compact ? `${s.label}: ${what}` : undefined}
            >
              {s.label}
            </Button>
          ),
        )}
        {confirmClose && (
          <Button variant="ghost" onClick={() => setConfirmClose(false)}>
            Keep it
          </Button>
        )}
      </div>
      {confirmClose && <p className="text-sm text-ink-soft">Closing takes it off the exchange for good.</p>}
      <FormError message={update.isError ? update.error.message : undefined} />
    </div>
  );
}

/** What the owner sees on their listing: edit and the state changes. */
export function OwnerControls({ listing }: { listing: ListingDto }) {
  return (
    <section aria-labelledby="owner-title" className="space-y-3 rounded-lg border border-rule bg-white p-4">
      <h2 id="owner-title" className="text-lg font-semibold">
        Your listing
      </h2>
      {listing.status !== 'closed' && (
        <LinkButton variant="secondary" to={paths.editListing(listing.id)}>
          Edit listing
        </LinkButton>
      )}
      <StatusButtons listing={listing} />
    </section>
  );
}
