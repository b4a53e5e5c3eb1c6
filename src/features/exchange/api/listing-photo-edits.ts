import { useAttachedPhotoMutations } from '@/lib/attached-photo-mutations.ts';
import { listingQueries } from './listing-queries.ts';

/** Alt text, order and delete for a listing's photos (its owner); the listing and the exchange lists refresh. */
export const useListingPhotoEdits = (listingId: number) =>
  useAttachedPhotoMutations(`/api/listings/${listingId}/photos`, listingQueries.all);
