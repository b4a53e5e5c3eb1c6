import { Link, useLocation } from 'react-router-dom';
import type { ListingDto } from '@shared/schemas/listing.ts';
import { AnchorButton } from '@/components/ui/link-button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { StatusBadge } from '@/components/ui/status-badge.tsx';
import { paths } from '@/config/paths.ts';
import { ContactForm } from './contact-form.tsx';
import { HideListingForm } from './hide-listing-form.tsx';
import { KindBadge } from './kind-badge.tsx';
import { statusBadge } from './labels.ts';
import { ListingDetails } from './listing-details.tsx';
import { ListingPhotoManager } from './listing-photo-manager.tsx';
import { OwnerControls } from './owner-controls.tsx';

/** One listing: details on the left; on the right what this viewer can do (write, manage, moderate). */
export function ListingView({ listing: l, signedIn }: { listing: ListingDto; signedIn: boolean }) {
  const location = useLocation();
  const badge = statusBadge[l.status];
  return (
    <article className="space-y-5">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to={paths.exchange} className="text-copper-dark underline">
          Exchange
        </Link>
      </nav>
      <header className="border-b border-rule pb-4">
        <div className="flex flex-wrap items-center gap-2">
          <KindBadge kind={l.kind} />
          <StatusBadge tone={badge.tone}>{badge.label}</StatusBadge>
        </div>
        <h1 className="mt-2 text-2xl font-semibold tracking-tight">
          <span className="num">{l.quantity}</span> × {l.part.name}
        </h1>
      </header>
      {l.hidden && (
        <Notice tone="danger" title="Hidden by a moderator">
          <p>{l.abilities.edit ? 'Only you and the moderators can see it.' : 'Only its owner and the moderators can see it.'}</p>
          {l.hiddenNote && <p>Note: {l.hiddenNote}</p>}
        </Notice>
      )}
      {l.status === 'reserved' && !l.abilities.edit && (
        <Notice>Reserved: the owner has promised these to someone, but you may still write in case it falls through.</Notice>
      )}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <ListingDetails listing={l} />
        <div className="space-y-4">
          {l.abilities.edit && <OwnerControls listing={l} />}
          {l.abilities.edit && <ListingPhotoManager listing={l} />}
          {l.abilities.message ? (
            <ContactForm listingId={l.id} owner={l.owner.login} />
          ) : !signedIn ? (
            <div className="space-y-2 rounded-lg border border-rule bg-white p-4">
              <p className="text-sm">
                Sign in to write to {l.owner.login}. Messages go through Scanwright; neither of you sees the other's e-mail address.
              </p>
              <AnchorButton href={paths.signIn(location.pathname)}>Sign in to write</AnchorButton>
            </div>
          ) : !l.abilities.edit && l.status === 'closed' ? (
            <p className="rounded-lg border border-rule bg-white p-4 text-sm text-ink-soft">This listing is closed; messages are off.</p>
          ) : null}
          {l.abilities.hide && <HideListingForm listing={l} />}
        </div>
      </div>
    </article>
  );
}
