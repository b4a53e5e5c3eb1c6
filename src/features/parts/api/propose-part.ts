import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ProposePartInput } from '@shared/schemas/part.ts';
import { api } from '@/lib/api-client.ts';
import { partQueries } from '@/lib/part-queries.ts';

/** Propose a part for the registry; it is listed once a moderator accepts it. */
export function useProposePart() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ProposePartInput) => api.post<{ id: number; status: string }>('/api/parts', input),
    onSuccess: () => qc.invalidateQueries({ queryKey: partQueries.all }),
  });
}
