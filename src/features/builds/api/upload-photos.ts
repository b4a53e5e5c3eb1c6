import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PhotoDto } from '@shared/schemas/build.ts';
import { upload } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

export interface UploadPhotoVariables {
  file: File;
  alt: string;
  entryId?: number | null;
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

/** Upload one photo per request, so each file gets its own progress and its own error. */
export function useUploadPhoto(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ file, alt, entryId, onProgress, signal }: UploadPhotoVariables) => {
      const form = new FormData();
      form.append('photos', file, file.name);
      form.append('alt', alt);
      if (entryId) form.append('entryId', String(entryId));
      const res = await upload<{ photos: PhotoDto[] }>(`/api/builds/${buildId}/photos`, form, onProgress, { signal });
      return res.photos[0];
    },
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}
