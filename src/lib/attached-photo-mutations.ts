import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import type { AttachedPhotoDto } from '@shared/schemas/attached-photo.ts';
import { api } from './api-client.ts';

/**
 * Upkeep of a part's or listing's stored photos under `base` (e.g. `/api/parts/7/photos`): alt text,
 * order and delete. Each refreshes the queries under `refresh` (the page that shows them).
 */
export function useAttachedPhotoMutations(base: string, refresh: QueryKey) {
  const qc = useQueryClient();
  const onSuccess = () => qc.invalidateQueries({ queryKey: refresh });
  return {
    update: useMutation({
      mutationFn: ({ photoId, alt }: { photoId: number; alt: string }) => api.patch<AttachedPhotoDto>(`${base}/${photoId}`, { alt }),
      onSuccess,
    }),
    reorder: useMutation({
      mutationFn: (photoIds: number[]) => api.put<{ photos: AttachedPhotoDto[] }>(`${base}/order`, { photoIds }),
      onSuccess,
    }),
    remove: useMutation({
      mutationFn: (photoId: number) => api.delete<void>(`${base}/${photoId}`),
      onSuccess,
    }),
  };
}
