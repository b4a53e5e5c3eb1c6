import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PhotoDto } from '@shared/schemas/build.ts';
import { uploadOnePhoto, type PhotoUploadVariables } from '@/lib/photo-upload.ts';
import { buildQueries } from './build-queries.ts';

export interface UploadPhotoVariables extends PhotoUploadVariables {
  entryId?: number | null;
}

/** Upload one photo per request, so each file gets its own progress and its own error. */
export function useUploadPhoto(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ entryId, ...photo }: UploadPhotoVariables) =>
      uploadOnePhoto<PhotoDto>(`/api/builds/${buildId}/photos`, photo, entryId ? { entryId: String(entryId) } : {}),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}
