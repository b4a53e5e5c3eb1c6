import type { ListingDto } from '@shared/schemas/listing.ts';
import { ListingTile } from './listing-tile.tsx';

/** The listing's first photo as a thumbnail, or the drawn tile of its part's kind when it has none. */
export function ListingThumb({ listing, className = 'aspect-[16/9]' }: { listing: ListingDto; className?: string }) {
  const photo = listing.photos[0];
  if (!photo) return <ListingTile category={listing.part.category} seed={listing.id} className={className} />;
  return (
    <div className={`overflow-hidden bg-paper-deep ${className}`}>
      <img src={photo.thumbUrl} alt={photo.alt} loading="lazy" className="h-full w-full object-cover" />
    </div>
  );
}
