import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AttachedPhotoDto } from '@shared/schemas/attached-photo.ts';
import { uploadOnePhoto, type PhotoUploadVariables } from '@/lib/photo-upload.ts';
import { partQueries } from '@/lib/part-queries.ts';

/** Add one photo to a registry part (its proposer or a moderator), one request per file for its own progress and error. */
export function useUploadPartPhoto(partId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (photo: PhotoUploadVariables) => uploadOnePhoto<AttachedPhotoDto>(`/api/parts/${partId}/photos`, photo),
    onSuccess: () => qc.invalidateQueries({ queryKey: partQueries.detail(partId).queryKey }),
  });
}
