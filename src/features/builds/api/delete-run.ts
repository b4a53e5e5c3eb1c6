import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Withdraw a calibration run that has not been accepted. */
export function useDeleteRun() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (runId: number) => api.delete<void>(`/api/runs/${runId}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}
