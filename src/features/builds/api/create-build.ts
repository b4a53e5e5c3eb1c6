import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BuildDto, CreateBuildInput } from '@shared/schemas/build.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Start a new build as a draft owned by the signed-in maker. */
export function useCreateBuild() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateBuildInput) => api.post<BuildDto>('/api/builds', input),
    onSuccess: async (build) => {
      qc.setQueryData(buildQueries.detail(build.id).queryKey, build);
      await qc.invalidateQueries({ queryKey: buildQueries.all });
    },
  });
}
