import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateRunInput, RunDto } from '@shared/schemas/run.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Record a calibration run; the answer carries the fit the server computed from the points. */
export function useCreateRun(actuatorId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateRunInput) => api.post<RunDto>(`/api/actuators/${actuatorId}/runs`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}
