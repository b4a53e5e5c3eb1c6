import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RunDto, UpdateRunInput } from '@shared/schemas/run.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Correct a run; an accepted one goes back to review. The answer carries the refitted run. */
export function useUpdateRun(runId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateRunInput) => api.patch<RunDto>(`/api/runs/${runId}`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}
