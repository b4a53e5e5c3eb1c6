import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateEntryInput, LogEntryDto, UpdateEntryInput } from '@shared/schemas/build.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Add a dated log entry to a build. */
export function useCreateEntry(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateEntryInput) => api.post<LogEntryDto>(`/api/builds/${buildId}/entries`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}

/** Change a log entry's date, title or text. */
export function useUpdateEntry(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ entryId, ...input }: UpdateEntryInput & { entryId: number }) =>
      api.patch<LogEntryDto>(`/api/builds/${buildId}/entries/${entryId}`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}

/** Remove a log entry. */
export function useDeleteEntry(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (entryId: number) => api.delete<void>(`/api/builds/${buildId}/entries/${entryId}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}
