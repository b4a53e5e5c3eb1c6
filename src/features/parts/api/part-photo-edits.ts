import { useAttachedPhotoMutations } from '@/lib/attached-photo-mutations.ts';
import { partQueries } from '@/lib/part-queries.ts';

/** Alt text, order and delete for a registry part's photos (its proposer or a moderator); the part page refreshes. */
export const usePartPhotoEdits = (partId: number) =>
  useAttachedPhotoMutations(`/api/parts/${partId}/photos`, partQueries.detail(partId).queryKey);
