import type { ListingDto } from '@shared/schemas/listing.ts';
import { PhotoManager } from '@/components/photos/photo-manager.tsx';
import { useDeleteListingPhoto } from '../api/delete-listing-photo.ts';
import { useUploadListingPhoto } from '../api/upload-listing-photo.ts';

/** For the listing's owner: add photos of what is offered or sought, or delete one. */
export function ListingPhotoManager({ listing }: { listing: ListingDto }) {
  const upload = useUploadListingPhoto(listing.id);
  const remove = useDeleteListingPhoto(listing.id);
  return (
    <section aria-labelledby="listing-photo-manager-title" className="space-y-3 rounded-lg border border-rule bg-white p-4">
      <h2 id="listing-photo-manager-title" className="text-lg font-semibold">Your photos</h2>
      <PhotoManager photos={listing.photos} upload={upload.mutateAsync} remove={remove.mutateAsync} label="Photos you can delete"
        empty="No photos yet. Photos of the actual parts, with their markings readable, answer most questions before anyone writes." />
    </section>
  );
}
