import { partQueries } from '@/lib/part-queries.ts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateListingInput, HideListingInput, ListingDto, UpdateListingInput } from '@shared/schemas/listing.ts';
import { api } from '@/lib/api-client.ts';
import { listingQueries } from './listing-queries.ts';

function useListingWrite<V>(send: (v: V) => Promise<ListingDto>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: async (listing) => {
      qc.setQueryData(listingQueries.detail(listing.id).queryKey, listing);
      await qc.invalidateQueries({ queryKey: listingQueries.all });
      await qc.invalidateQueries({ queryKey: partQueries.detail(listing.part.id).queryKey });
    },
  });
}

/** Offer or seek a listed part. */
export const useCreateListing = () => useListingWrite((input: CreateListingInput) => api.post<ListingDto>('/api/listings', input));

/** The owner edits a listing or moves it open → reserved → closed. */
export const useUpdateListing = (id: number) =>
  useListingWrite((input: UpdateListingInput) => api.patch<ListingDto>(`/api/listings/${id}`, input));

/** A moderator hides a listing (or shows it again), with a note for the audit trail. */
export const useHideListing = (id: number) =>
  useListingWrite((input: HideListingInput) => api.post<ListingDto>(`/api/listings/${id}/visibility`, input));
