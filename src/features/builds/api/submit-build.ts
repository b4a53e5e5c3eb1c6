import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BuildDto } from '@shared/schemas/build.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Hand a draft or returned build to the review desk. */
export function useSubmitBuild(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<BuildDto>(`/api/builds/${buildId}/submit`),
    onSuccess: async (build) => {
      qc.setQueryData(buildQueries.detail(build.id).queryKey, build);
      await qc.invalidateQueries({ queryKey: buildQueries.all });
    },
  });
}
