import { useMutation } from '@tanstack/react-query';
import type { CreateReportInput } from '@shared/schemas/review.ts';
import { api } from '@/lib/api-client.ts';

/** Report a registry part to the moderators (wrong data, duplicate, …). */
export function useReportPart() {
  return useMutation({
    mutationFn: (input: Omit<CreateReportInput, 'targetType'>) =>
      api.post<{ id: number }>('/api/reports', { ...input, targetType: 'part' }),
  });
}
