import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BuildDto } from '@shared/schemas/build.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Take a build pending review back to draft, to change it before a moderator looks. */
export function useWithdrawBuild(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<BuildDto>(`/api/builds/${buildId}/withdraw`),
    onSuccess: async (build) => {
      qc.setQueryData(buildQueries.detail(build.id).queryKey, build);
      await qc.invalidateQueries({ queryKey: buildQueries.all });
    },
  });
}
