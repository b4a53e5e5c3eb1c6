import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import type { SaveLinearisationInput } from '@shared/schemas/linearise.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Save a drive linearisation onto an actuator; the server fits the run again and keeps its table. */
export function useSaveLinearisation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ actuatorId, input }: { actuatorId: number; input: SaveLinearisationInput }) =>
      api.put<ActuatorDto>(`/api/actuators/${actuatorId}/linearisation`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}
