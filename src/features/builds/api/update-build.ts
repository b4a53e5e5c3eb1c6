import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BuildDto, UpdateBuildInput } from '@shared/schemas/build.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Change a build's details (title, kind, stage, summary, write-up); 409 build_locked while under review. */
export function useUpdateBuild(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateBuildInput) => api.patch<BuildDto>(`/api/builds/${buildId}`, input),
    onSuccess: async (build) => {
      qc.setQueryData(buildQueries.detail(build.id).queryKey, build);
      await qc.invalidateQueries({ queryKey: buildQueries.all });
    },
  });
}
