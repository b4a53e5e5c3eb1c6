import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import { listingQueries } from './listing-queries.ts';

/** The owner removes a photo from a listing. */
export function useDeleteListingPhoto(listingId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (photoId: number) => api.delete<void>(`/api/listings/${listingId}/photos/${photoId}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: listingQueries.all }),
  });
}
