import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ListingPhotoDto } from '@shared/schemas/listing.ts';
import { uploadOnePhoto, type PhotoUploadVariables } from '@/lib/photo-upload.ts';
import { listingQueries } from './listing-queries.ts';

/** The owner adds one photo to a listing; the listing and the exchange lists (which show the first photo) refresh. */
export function useUploadListingPhoto(listingId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (photo: PhotoUploadVariables) => uploadOnePhoto<ListingPhotoDto>(`/api/listings/${listingId}/photos`, photo),
    onSuccess: () => qc.invalidateQueries({ queryKey: listingQueries.all }),
  });
}
