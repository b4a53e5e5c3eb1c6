import type { ListingDto } from '@shared/schemas/listing.ts';
import { partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { PhotoGrid } from '@/components/photos/photo-grid.tsx';
import { ListingTile } from './listing-tile.tsx';

/** The listing's photos (each opens large with its description), or a drawing of the part's kind while it has none. */
export function ListingPhotos({ listing: l }: { listing: ListingDto }) {
  if (l.photos.length > 0) return <PhotoGrid photos={l.photos} label="Photos of this listing" columns="grid-cols-2 sm:grid-cols-3" />;
  return (
    <figure className="overflow-hidden rounded-lg border border-rule">
      <ListingTile category={l.part.category} seed={l.id} className="aspect-[21/9]" />
      <figcaption className="bg-white px-3 py-1.5 text-xs text-ink-soft">
        No photos yet: a drawing of a {partCategoryLabels[l.part.category].toLowerCase()}.
      </figcaption>
    </figure>
  );
}
