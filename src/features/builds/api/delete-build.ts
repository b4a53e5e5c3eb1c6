import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Delete a draft for good (the server refuses anything that was ever submitted). */
export function useDeleteBuild(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete<void>(`/api/builds/${buildId}`),
    onSuccess: async () => {
      qc.removeQueries({ queryKey: buildQueries.detail(buildId).queryKey });
      await qc.invalidateQueries({ queryKey: buildQueries.all });
    },
  });
}
