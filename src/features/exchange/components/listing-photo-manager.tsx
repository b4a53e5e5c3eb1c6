import type { ListingDto } from '@shared/schemas/listing.ts';
import { PhotoManager } from '@/components/photos/photo-manager.tsx';
import { useListingPhotoEdits } from '../api/listing-photo-edits.ts';
import { useUploadListingPhoto } from '../api/upload-listing-photo.ts';

/** For the listing's owner: add photos of what is offered or sought; describe, reorder or delete them. */
export function ListingPhotoManager({ listing }: { listing: ListingDto }) {
  const upload = useUploadListingPhoto(listing.id);
  const edits = useListingPhotoEdits(listing.id);
  return (
    <section aria-labelledby="listing-photo-manager-title" className="space-y-3 rounded-lg border border-rule bg-white p-4">
      <h2 id="listing-photo-manager-title" className="text-lg font-semibold">
        Your photos
      </h2>
      <PhotoManager
        photos={listing.photos}
        upload={upload.mutateAsync}
        edits={edits}
        label="Photos you can change"
        empty="No photos yet. Photos of the actual parts, with their markings readable, answer most questions before anyone writes."
      />
    </section>
  );
}
