import { Link } from 'react-router-dom';
import type { PartListingRefDto } from '@shared/schemas/part.ts';
import { listingConditionLabels, type ListingCondition } from '@shared/schemas/listing-vocabulary.ts';
import { paths } from '@/config/paths.ts';

/** Open exchange listings for this part, each linking to the listing. */
export function PartListings({ partId, listings, signedIn }: { partId: number; listings: PartListingRefDto[]; signedIn: boolean }) {
  return (
    <section aria-labelledby="part-listings-title">
      <div className="mb-2 flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="part-listings-title" className="text-lg font-semibold">
          On the exchange
        </h2>
        {signedIn && (
          <Link to={`${paths.newListing}?partId=${partId}`} className="text-sm text-copper-dark underline">
            Offer or seek one
          </Link>
        )}
      </div>
      {listings.length === 0 ? (
        <p className="rounded-lg border border-dashed border-rule bg-white p-3 text-sm text-ink-soft">
          Nobody is offering or seeking this part right now.
        </p>
      ) : (
        <ul className="divide-y divide-rule rounded-lg border border-rule bg-white">
          {listings.map((l) => (
            <li key={l.id} className="flex flex-wrap items-baseline gap-x-3 gap-y-1 px-3 py-2 text-sm">
              <span
                className={`rounded px-1.5 py-0.5 text-xs font-semibold ${l.kind === 'offering' ? 'bg-teal text-white' : 'bg-amber/20 text-ink'}`}
              >
                {l.kind === 'offering' ? 'Offering' : 'Seeking'}
              </span>
              <Link to={paths.listing(l.id)} className="font-medium text-copper-dark underline decoration-copper/40 underline-offset-2">
                {l.kind === 'offering' ? (
                  <>
                    <span className="num">{l.quantity}</span> from {l.owner}
                  </>
                ) : (
                  <>
                    {l.owner} wants <span className="num">{l.quantity}</span>
                  </>
                )}
              </Link>
              <span className="text-ink-soft">{listingConditionLabels[l.condition as ListingCondition] ?? l.condition}</span>
              <span className="num">{l.priceLabel}</span>
              <span className="text-ink-soft">{l.region}</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
