import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import { partQueries } from './part-queries.ts';

/** Remove a photo from a registry part. */
export function useDeletePartPhoto(partId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (photoId: number) => api.delete<void>(`/api/parts/${partId}/photos/${photoId}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: partQueries.detail(partId).queryKey }),
  });
}
