import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BuildDto, PhotoDto, UpdatePhotoInput } from '@shared/schemas/build.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Change a photo's alt text or the log entry it belongs to. */
export function useUpdatePhoto(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ photoId, ...input }: UpdatePhotoInput & { photoId: number }) =>
      api.patch<PhotoDto>(`/api/builds/${buildId}/photos/${photoId}`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}

/** Remove a photo from the build. */
export function useDeletePhoto(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (photoId: number) => api.delete<void>(`/api/builds/${buildId}/photos/${photoId}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}

/** Make a photo the build's cover. */
export function useSetCoverPhoto(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (photoId: number) => api.post<{ cover: PhotoDto }>(`/api/builds/${buildId}/photos/${photoId}/cover`),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}

/** Put the gallery in a new order; shown at once, rolled back if the server refuses. */
export function useReorderPhotos(buildId: number) {
  const qc = useQueryClient();
  const key = buildQueries.detail(buildId).queryKey;
  return useMutation({
    mutationFn: (photoIds: number[]) => api.put<{ photos: PhotoDto[] }>(`/api/builds/${buildId}/photos/order`, { photoIds }),
    onMutate: async (photoIds) => {
      await qc.cancelQueries({ queryKey: key });
      const before = qc.getQueryData<BuildDto>(key);
      if (before) {
        const byId = new Map(before.photos.map((p) => [p.id, p]));
        const photos = photoIds.flatMap((id, position) => (byId.has(id) ? [{ ...byId.get(id)!, position }] : []));
        qc.setQueryData<BuildDto>(key, { ...before, photos });
      }
      return { before };
    },
    onError: (_err, _ids, context) => {
      if (context?.before) qc.setQueryData(key, context.before);
    },
    onSettled: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}
